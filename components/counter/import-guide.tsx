import { CATALOG_CSV_COLUMNS } from "@/lib/catalog-csv/columns";

const linkClass = "inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4";

/** The template, what each column means, and the export that reads back in unchanged. */
export function ImportGuide() {
  return (
    <aside aria-labelledby="import-guide-heading" className="flex flex-col gap-6">
      <section className="flex flex-col gap-2">
        <h2 id="import-guide-heading" className="text-xl font-semibold">
          The CSV file
        </h2>
        <p className="text-ink-soft">
          One row per stock item under a header row. Columns may come in any order; a row updates the item with its SKU or adds it.
        </p>
        <a href="/downloads/sidewise-catalog-template.csv" download className={linkClass}>
          Download the template CSV
        </a>
        <a href="/downloads/sidewise-catalog-columns.csv" download className={linkClass}>
          Download the column guide (CSV)
        </a>
      </section>
      <div role="region" aria-label="The columns" tabIndex={0} className="overflow-x-auto rounded border border-rule bg-sheet">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="px-3 py-2 text-left font-semibold">The columns</caption>
          <thead>
            <tr className="border-b border-rule">
              <th scope="col" className="px-3 py-2 font-semibold">Column</th>
              <th scope="col" className="px-3 py-2 font-semibold">What it holds</th>
            </tr>
          </thead>
          <tbody>
            {CATALOG_CSV_COLUMNS.map((column) => (
              <tr key={column.name} className="border-b border-grid align-top last:border-b-0">
                <th scope="row" className="px-3 py-2 text-left font-mono font-semibold">
                  {column.name}
                  <span className="block font-sans text-xs font-normal text-ink-soft">{column.required ? "required" : "optional"}</span>
                </th>
                <td className="px-3 py-2">
                  {column.meaning}
                  {column.example ? <span className="mt-1 block text-ink-soft">Example: <span className="font-mono text-ink">{column.example}</span></span> : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <section aria-labelledby="export-heading" className="flex flex-col gap-2">
        <h2 id="export-heading" className="text-xl font-semibold">
          Export
        </h2>
        <a href="/api/v1/catalog/export" download className={linkClass}>
          Export the whole catalog as CSV
        </a>
        <p className="text-ink-soft">An exported file has the same columns as the template: import it again as it is and nothing changes.</p>
      </section>
    </aside>
  );
}
