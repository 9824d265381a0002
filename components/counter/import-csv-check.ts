import Papa from "papaparse";
import { normalizeHeaderName, REQUIRED_CATALOG_CSV_COLUMNS, type CatalogCsvRecord, type CsvRefusal } from "@/lib/catalog-csv/columns";
import { readCsvRow } from "@/lib/catalog-csv/read-row";

export const CSV_LIMIT_BYTES = 5 * 1024 * 1024;
export const PREVIEW_ROW_COUNT = 10;
export const LISTED_PROBLEM_COUNT = 20;
const CHUNK_CHARACTERS = 64 * 1024;

/** What the browser has found in a CSV so far; `done` once the whole file has been read. */
export interface CsvCheck {
  fields: string[];
  previewRows: string[][];
  rowsRead: number;
  validRows: number;
  problemRows: number;
  /** The first problems found, at most LISTED_PROBLEM_COUNT of them. */
  problems: CsvRefusal[];
  problemCount: number;
  /** True when the header row itself is wrong: no row can be read until it is fixed. */
  headerRefused: boolean;
  fraction: number;
  done: boolean;
}

const megabytes = (bytes: number) => (bytes / (1024 * 1024)).toFixed(1);

/** Why a chosen file cannot be imported at all, or null when it may be read. */
export function fileRefusal(file: File): string | null {
  const looksLikeCsv = /\.csv$/i.test(file.name) || file.type === "text/csv";
  if (!looksLikeCsv) {
    return `“${file.name}” is not a CSV file. Save the sheet as CSV (comma-separated values) and choose that file.`;
  }
  if (file.size > CSV_LIMIT_BYTES) {
    return `“${file.name}” is ${megabytes(file.size)} MB; the limit is 5 MB. Split it into smaller CSV files and import them one by one.`;
  }
  if (file.size === 0) return `“${file.name}” is empty. Choose a CSV with a header row and at least one row.`;
  return null;
}

function checkCsvHeader(fields: readonly string[]): CsvRefusal[] {
  return REQUIRED_CATALOG_CSV_COLUMNS.filter((column) => !fields.includes(column)).map((column) => ({
    line: 1,
    column,
    reason: `the header has no ${column} column; add it (see the columns and the template)`,
  }));
}

const isBlank = (record: CatalogCsvRecord) =>
  Object.values(record).every((value) => value === undefined || value === null || String(value).trim() === "");

function emptyCheck(): CsvCheck {
  return { fields: [], previewRows: [], rowsRead: 0, validRows: 0, problemRows: 0, problems: [], problemCount: 0, headerRefused: false, fraction: 0, done: false };
}

function noteProblems(check: CsvCheck, refusals: readonly CsvRefusal[]) {
  check.problemCount += refusals.length;
  const room = LISTED_PROBLEM_COUNT - check.problems.length;
  if (room > 0) check.problems.push(...refusals.slice(0, room));
}

/**
 * Reads a CSV in chunks with the same row checks as the server, reporting after each chunk and
 * giving the page a turn to repaint in between. Line numbers count the header as line 1.
 */
export async function checkCsvFile(file: File, onProgress: (check: CsvCheck) => void, signal?: AbortSignal): Promise<CsvCheck> {
  const text = await file.text();
  const check = emptyCheck();
  let recordIndex = 0;

  return new Promise((resolve) => {
    const finish = () => {
      check.done = true;
      check.fraction = 1;
      onProgress({ ...check });
      resolve(check);
    };
    Papa.parse<CatalogCsvRecord>(text, {
      header: true,
      transformHeader: normalizeHeaderName,
      delimiter: ",",
      chunkSize: CHUNK_CHARACTERS,
      chunk(results: Papa.ParseResult<CatalogCsvRecord>, parser: Papa.Parser) {
        if (check.fields.length === 0) {
          check.fields = results.meta.fields ?? [];
          const headerProblems = checkCsvHeader(check.fields);
          if (headerProblems.length > 0) {
            check.headerRefused = true;
            noteProblems(check, headerProblems);
            parser.abort();
            return;
          }
        }
        for (const record of results.data) {
          const line = recordIndex + 2;
          recordIndex += 1;
          if (isBlank(record)) continue;
          check.rowsRead += 1;
          if (check.previewRows.length < PREVIEW_ROW_COUNT) check.previewRows.push(check.fields.map((field) => (record as Record<string, string | undefined>)[field] ?? ""));
          const result = readCsvRow(record, line);
          if (result.ok) check.validRows += 1;
          else {
            check.problemRows += 1;
            noteProblems(check, result.refusals);
          }
        }
        check.fraction = Math.min(1, results.meta.cursor / Math.max(1, text.length));
        onProgress({ ...check, problems: [...check.problems], previewRows: [...check.previewRows] });
        if (signal?.aborted) {
          parser.abort();
          return;
        }
        parser.pause();
        setTimeout(() => parser.resume(), 0);
      },
      complete: finish,
    });
  });
}
