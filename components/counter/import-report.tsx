"use client";

import { useEffect, useRef } from "react";
import { formatInteger } from "@/lib/tire";
import { ImportRefusals } from "./import-refusals";
import type { ImportReport as Report } from "./import-upload";

const rows = (count: number) => `${formatInteger(count)} ${count === 1 ? "row" : "rows"}`;

/** The outcome in one plain sentence: whether anything was written, and what to do next. */
export function reportSummary(report: Report, refusedRows: number): string {
  if (!report.written) {
    if (refusedRows === 0) return "Nothing was written.";
    return `Nothing was written: ${rows(refusedRows)} ${refusedRows === 1 ? "was" : "were"} refused. Fix them and upload again, or choose “Import the valid rows only”.`;
  }
  const written = `Written: ${rows(report.added)} added, ${rows(report.updated)} updated.`;
  if (refusedRows === 0) return written;
  return `${written} ${rows(refusedRows)} ${refusedRows === 1 ? "was" : "were"} refused and left out; fix them and upload those rows again.`;
}

function Count({ label, value }: { label: string; value: number }) {
  return (
    <div className="rounded border border-rule bg-sheet px-3 py-2">
      <dt className="text-sm text-ink-soft">{label}</dt>
      <dd className="font-mono text-2xl font-semibold">{formatInteger(value)}</dd>
    </div>
  );
}

/** The server's answer to an import; the heading takes focus so the outcome is read out first. */
export function ImportReport({ report, onReset }: { report: Report; onReset: () => void }) {
  const headingRef = useRef<HTMLHeadingElement>(null);
  useEffect(() => headingRef.current?.focus(), []);
  const refusedRows = new Set(report.refused.map((refusal) => refusal.line)).size;

  return (
    <section aria-labelledby="import-report-heading" className="flex flex-col gap-4">
      <h2 id="import-report-heading" ref={headingRef} tabIndex={-1} className="text-2xl font-semibold">
        Import report
      </h2>
      <p className={`rounded border-l-4 p-3 font-semibold ${report.written ? "border-accent bg-accent-soft" : "border-danger bg-caution-soft"}`}>
        {reportSummary(report, refusedRows)}
      </p>
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        <Count label={report.written ? "Added" : "Would be added"} value={report.added} />
        <Count label={report.written ? "Updated" : "Would be updated"} value={report.updated} />
        {report.unchanged !== undefined ? <Count label="Unchanged" value={report.unchanged} /> : null}
        <Count label="Rows refused" value={refusedRows} />
      </dl>
      {report.refused.length > 0 ? (
        <div className="flex flex-col gap-2">
          <h3 className="font-semibold">Refused rows</h3>
          <ImportRefusals caption="Rows the server refused" refusals={report.refused} total={report.refused.length} />
        </div>
      ) : null}
      <button type="button" onClick={onReset} className="min-h-11 self-start rounded bg-accent px-4 font-semibold text-sheet">
        Upload another file
      </button>
    </section>
  );
}
