import { formatInteger } from "@/lib/tire";
import type { CsvCheck } from "./import-csv-check";
import { ImportRefusals } from "./import-refusals";

function Count({ label, value, tone }: { label: string; value: number; tone?: "danger" }) {
  return (
    <div className="rounded border border-rule bg-sheet px-3 py-2">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className={`font-mono text-2xl font-semibold ${tone === "danger" && value > 0 ? "text-danger" : ""}`}>{formatInteger(value)}</dd>
    </div>
  );
}

/** The first rows as the file holds them, the counts so far and the problems found in the browser. */
export function ImportPreview({ fileName, check }: { fileName: string; check: CsvCheck }) {
  return (
    <section aria-labelledby="import-preview-heading" className="flex flex-col gap-4">
      <h2 id="import-preview-heading" className="text-xl font-semibold">
        Preview of {fileName}
      </h2>
      <dl className="grid grid-cols-3 gap-2">
        <Count label="Rows read" value={check.rowsRead} />
        <Count label="Rows that look valid" value={check.validRows} />
        <Count label="Rows with problems" value={check.problemRows} tone="danger" />
      </dl>
      {check.previewRows.length > 0 ? (
        <div role="region" aria-label={`First ${check.previewRows.length} rows`} tabIndex={0} className="overflow-x-auto rounded border border-rule bg-sheet">
          <table className="w-full border-collapse text-left text-sm whitespace-nowrap">
            <caption className="px-3 py-2 text-left text-ink-soft">First {formatInteger(check.previewRows.length)} rows of the file</caption>
            <thead>
              <tr className="border-b border-rule">
                {check.fields.map((field) => (
                  <th key={field} scope="col" className="px-3 py-2 font-mono font-semibold">
                    {field}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {check.previewRows.map((row, rowIndex) => (
                <tr key={rowIndex} className="border-b border-grid last:border-b-0">
                  {row.map((value, columnIndex) => (
                    <td key={columnIndex} className="px-3 py-2 font-mono">
                      {value}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {check.problemCount > 0 ? (
        <div className="flex flex-col gap-2">
          <h3 className="font-semibold">{check.done ? "Problems found" : "Problems found so far"}</h3>
          <ImportRefusals caption="Problems found in the browser" refusals={check.problems} total={check.problemCount} />
        </div>
      ) : null}
    </section>
  );
}
