import type { Metadata } from "next";
import Link from "next/link";
import { connection } from "next/server";
import { z } from "zod";
import { getDb } from "@/lib/database/app-database";
import { CatalogFilterForm } from "@/components/counter/catalog-filter-form";
import { CatalogPagination } from "@/components/counter/catalog-pagination";
import { CatalogStatus } from "@/components/counter/catalog-status";
import { CatalogTable } from "@/components/counter/catalog-table";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { PageIntro } from "@/components/ui/page-intro";
import { requirePageUser } from "@/lib/auth/page-user";
import { skuSchema } from "@/lib/validation/sku";
import { getCatalogTablePage, readCatalogFilters, catalogQueryString } from "@/lib/counter/catalog-table";
import { listBrandNames } from "@/lib/finder/queries";
import { formatInteger } from "@/lib/tire";

export const metadata: Metadata = { title: "Counter · Catalog", robots: { index: false } };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

const skuOutcome = z.object({
  added: skuSchema.optional().catch(undefined),
  saved: skuSchema.optional().catch(undefined),
  retired: skuSchema.optional().catch(undefined),
});

export default async function CounterCatalogPage({ searchParams }: { searchParams: SearchParams }) {
  const access = await requirePageUser("/counter", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  await connection();
  const params = await searchParams;
  const filters = readCatalogFilters(params);
  const outcome = skuOutcome.parse(params);
  const db = await getDb();
  const [table, brands] = await Promise.all([getCatalogTablePage(db, filters), listBrandNames(db)]);
  const exportQuery = catalogQueryString({ ...filters, page: 1 });
  return (
    <section className="flex flex-col gap-5">
      <PageIntro eyebrow="Staff" title="Counter: the catalog">
        <p>Find an item, change its price or quantity in place, or open it to edit everything.</p>
      </PageIntro>
      <CatalogStatus {...outcome} />
      <div className="flex flex-wrap gap-x-6 gap-y-2">
        <Link href="/counter/items/new" prefetch={false} className="inline-flex min-h-11 items-center rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90">
          Add an item
        </Link>
        <a href={`/api/v1/catalog/export${exportQuery ? `?${exportQuery}` : ""}`} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
          Export these rows as CSV
        </a>
      </div>
      <CatalogFilterForm filters={filters} brands={brands} />
      <p className="font-semibold" aria-live="polite">
        {formatInteger(table.total)} {table.total === 1 ? "item" : "items"} · page {formatInteger(table.page)} of {formatInteger(table.pageCount)}
      </p>
      {table.rows.length > 0 ? (
        <>
          <CatalogTable rows={table.rows} filters={filters} />
          <CatalogPagination filters={filters} pageCount={table.pageCount} />
        </>
      ) : (
        <CatalogEmpty beyondLastPage={table.total > 0} firstPageHref={`/counter?${catalogQueryString(filters, { page: 1 })}`} />
      )}
    </section>
  );
}

function CatalogEmpty({ beyondLastPage, firstPageHref }: { beyondLastPage: boolean; firstPageHref: string }) {
  return (
    <div className="rounded border border-dashed border-rule bg-sheet p-6">
      <h2 className="text-xl font-semibold">{beyondLastPage ? "This page is past the last one" : "No item matches these filters"}</h2>
      <p className="mt-2 text-ink-soft">
        {beyondLastPage ? "The items are on earlier pages." : "Try a shorter search, another brand or season, or clear the filters."}
      </p>
      <Link href={beyondLastPage ? firstPageHref : "/counter"} prefetch={false} className="mt-3 inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        {beyondLastPage ? "Go to the first page" : "Clear the filters"}
      </Link>
    </div>
  );
}
