import Link from "next/link";
import { LINES_PAGE_PATH } from "@/lib/brands/line-words";
import { formatInteger } from "@/lib/tire";

interface Refusal {
  line: number;
  column?: string | null;
  reason: string;
}

/** Problems found in a CSV, one per row: where (line and column) and what is wrong. */
export function ImportRefusals({ caption, refusals, total }: { caption: string; refusals: readonly Refusal[]; total: number }) {
  const more = total - refusals.length;
  const aboutLines = refusals.some((refusal) => refusal.line > 1 && (refusal.column === "brand" || refusal.column === "line"));
  return (
    <div className="flex flex-col gap-2">
      <div role="region" aria-label={caption} tabIndex={0} className="max-h-96 overflow-auto rounded border border-rule bg-sheet">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">{caption}</caption>
          <thead className="sticky top-0 bg-sheet">
            <tr className="border-b border-rule">
              <th scope="col" className="px-3 py-2 font-semibold">Line</th>
              <th scope="col" className="px-3 py-2 font-semibold">Column</th>
              <th scope="col" className="px-3 py-2 font-semibold">What is wrong</th>
            </tr>
          </thead>
          <tbody>
            {refusals.map((refusal, index) => (
              <tr key={`${refusal.line}-${refusal.column ?? ""}-${index}`} className="border-b border-grid align-top last:border-b-0">
                <td className="px-3 py-2 font-mono">{refusal.line}</td>
                <td className="px-3 py-2 font-mono">{refusal.column || "—"}</td>
                <td className="px-3 py-2">{refusal.reason}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {more > 0 ? <p className="text-sm text-ink-soft">…and {formatInteger(more)} more not listed here.</p> : null}
      {aboutLines ? (
        <p>
          A brand or line the catalog lacks, or a retired line?{" "}
          <Link href={LINES_PAGE_PATH} prefetch={false} className="font-semibold text-accent underline underline-offset-2">
            Add it on the Lines page
          </Link>
          , or un-retire the line there, then choose the file again.
        </p>
      ) : null}
    </div>
  );
}
