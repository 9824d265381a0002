import Link from "next/link";
import type { CatalogFilters } from "@/lib/counter/catalog-filters";
import { catalogQueryString } from "@/lib/counter/catalog-table";

const linkClass = "inline-flex min-h-11 min-w-11 items-center justify-center rounded border px-3 font-semibold";

/** Page numbers to offer: the first, the last, and two either side of the current one. */
export function pagesAround(page: number, pageCount: number): (number | "gap")[] {
  const wanted = new Set([1, pageCount, page - 2, page - 1, page, page + 1, page + 2].filter((n) => n >= 1 && n <= pageCount));
  const sorted = [...wanted].sort((a, b) => a - b);
  return sorted.flatMap((n, index) => (index > 0 && n - sorted[index - 1]! > 1 ? (["gap", n] as const) : [n]));
}

export function CatalogPagination({ filters, pageCount }: { filters: CatalogFilters; pageCount: number }) {
  if (pageCount <= 1) return null;
  const href = (page: number) => `/counter?${catalogQueryString(filters, { page })}`;
  const { page } = filters;
  return (
    <nav aria-label="Catalog pages">
      <ul className="flex flex-wrap items-center gap-2">
        <li>
          {page > 1 ? (
            <Link href={href(page - 1)} prefetch={false} className={`${linkClass} border-rule bg-sheet text-accent`}>
              Previous
            </Link>
          ) : (
            <span className={`${linkClass} border-rule text-ink-soft`} aria-disabled="true">Previous</span>
          )}
        </li>
        {pagesAround(page, pageCount).map((n, index) =>
          n === "gap" ? (
            <li key={`gap-${index}`} aria-hidden="true" className="px-1 text-ink-soft">
              …
            </li>
          ) : (
            <li key={n}>
              <Link href={href(n)} prefetch={false} aria-current={n === page ? "page" : undefined} aria-label={`Page ${n}`}
                className={`${linkClass} ${n === page ? "border-accent bg-accent text-sheet" : "border-rule bg-sheet text-accent"}`}>
                {n}
              </Link>
            </li>
          ),
        )}
        <li>
          {page < pageCount ? (
            <Link href={href(page + 1)} prefetch={false} className={`${linkClass} border-rule bg-sheet text-accent`}>
              Next
            </Link>
          ) : (
            <span className={`${linkClass} border-rule text-ink-soft`} aria-disabled="true">Next</span>
          )}
        </li>
      </ul>
    </nav>
  );
}
