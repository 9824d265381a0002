"use client";

import { useEffect, useRef, useState } from "react";
import type { ImportMode } from "@/lib/catalog-csv/import-report";
import type { CatalogLines } from "@/lib/catalog-csv/judge-lines";
import { formatInteger } from "@/lib/tire";
import { checkCsvFile, fileRefusal, importButtonText, type CsvCheck } from "./import-csv-check";
import { ImportDropZone } from "./import-drop-zone";
import { ImportModeChoice } from "./import-mode-choice";
import { ImportPreview } from "./import-preview";
import { ImportProgress } from "./import-progress";
import { ImportReport } from "./import-report";
import { uploadCatalogCsv, type ImportReport as Report } from "./import-upload";

type Upload = { state: "idle" } | { state: "sending"; fraction: number | null } | { state: "failed"; message: string };

const percent = (fraction: number) => `${Math.round(fraction * 100)} %`;

function readingText(check: CsvCheck): string {
  const rows = `${formatInteger(check.rowsRead)} ${check.rowsRead === 1 ? "row" : "rows"}`;
  if (check.done) return `${rows} read and checked · 100 %`;
  return `${rows} read and checked… · ${percent(check.fraction)} of the file`;
}

function uploadText(fraction: number | null): string {
  return fraction === null ? "Sent. The server is checking and writing the rows…" : `Sending the file… · ${percent(fraction)}`;
}

/** What stops the file from being imported as it stands, or null when the Import button may be used. */
function blocker(check: CsvCheck): string | null {
  if (check.unreadable) return check.unreadable;
  if (check.headerRefused) return "The header row is not right, so no row can be read. Fix the header (see the columns beside), then choose the file again.";
  if (check.rowsRead === 0) return "The file has no rows under its header. Add the stock items, one per row, then choose the file again.";
  return null;
}

/**
 * Choose a CSV, see it read and checked in the browser, import it, and read the server's report.
 * `lines` are the brands and lines the server judges the rows against, read when the page was.
 */
export function ImportPanel({ lines }: { lines: CatalogLines }) {
  const [refusal, setRefusal] = useState<string | null>(null);
  const [file, setFile] = useState<File | null>(null);
  const [check, setCheck] = useState<CsvCheck | null>(null);
  const [mode, setMode] = useState<ImportMode>("all-or-nothing");
  const [upload, setUpload] = useState<Upload>({ state: "idle" });
  const [report, setReport] = useState<Report | null>(null);
  const [startedOver, setStartedOver] = useState(false);
  const reading = useRef<AbortController | null>(null);

  useEffect(() => () => reading.current?.abort(), []);

  function choose(chosen: File) {
    reading.current?.abort();
    setUpload({ state: "idle" });
    const refused = fileRefusal(chosen);
    setRefusal(refused);
    if (refused) {
      setFile(null);
      setCheck(null);
      return;
    }
    const controller = new AbortController();
    reading.current = controller;
    setFile(chosen);
    setCheck(null);
    void checkCsvFile(chosen, lines, (progress) => {
      if (!controller.signal.aborted) setCheck(progress);
    }, controller.signal);
  }

  async function send() {
    if (!file || upload.state === "sending") return;
    setUpload({ state: "sending", fraction: 0 });
    const outcome = await uploadCatalogCsv(file, mode, (fraction) => setUpload({ state: "sending", fraction }));
    if (outcome.ok) {
      setUpload({ state: "idle" });
      setReport(outcome.report);
    } else setUpload({ state: "failed", message: outcome.message });
  }

  function reset() {
    reading.current?.abort();
    setRefusal(null);
    setFile(null);
    setCheck(null);
    setUpload({ state: "idle" });
    setReport(null);
    setStartedOver(true);
  }

  if (report) return <ImportReport report={report} onReset={reset} />;

  const sending = upload.state === "sending";
  const stop = check?.done ? blocker(check) : null;
  return (
    <div className="flex flex-col gap-6">
      {sending ? null : <ImportDropZone error={refusal} onFile={choose} autoFocus={startedOver} />}
      {file ? (
        <ImportProgress
          id="reading-progress"
          label={`Reading and checking ${file.name}`}
          value={check?.fraction ?? 0}
          text={check ? readingText(check) : "Opening the file…"}
        />
      ) : null}
      {file && check ? <ImportPreview fileName={file.name} check={check} /> : null}
      {stop ? (
        <p className="rounded border-l-4 border-danger bg-caution-soft p-3 font-semibold">{stop}</p>
      ) : null}
      {file && check?.done && !stop ? (
        <section aria-labelledby="import-send-heading" className="flex flex-col gap-4">
          <h2 id="import-send-heading" className="text-xl font-semibold">
            Import
          </h2>
          <ImportModeChoice mode={mode} disabled={sending} onChange={setMode} />
          {sending ? <ImportProgress id="upload-progress" label="Uploading" value={upload.fraction} text={uploadText(upload.fraction)} /> : null}
          <div role="alert" className="text-danger">
            {upload.state === "failed" ? upload.message : ""}
          </div>
          <button
            type="button"
            onClick={send}
            disabled={sending}
            className="min-h-11 self-start rounded bg-accent px-6 py-2 text-left font-semibold text-sheet disabled:opacity-60"
          >
            {sending ? "Importing…" : importButtonText(check, mode)}
          </button>
        </section>
      ) : null}
    </div>
  );
}
