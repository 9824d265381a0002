import Papa from "papaparse";
import type { ImportMode } from "@/lib/catalog-csv/import-report";
import type { CsvRefusal } from "@/lib/catalog-csv/columns";
import { judgeRowLines, lineJudge, type CatalogLines, type LineJudge } from "@/lib/catalog-csv/judge-lines";
import { normalizeCsvText } from "@/lib/catalog-csv/line-endings";
import { isSkippedRow, readCatalogHeader, readCatalogRows } from "@/lib/catalog-csv/read-file";
import { formatInteger } from "@/lib/tire";
import { EXPORT_AS_CSV, MAX_IMPORT_BYTES, MAX_IMPORT_SIZE_TEXT, notCsvFileMessage } from "@/lib/catalog-csv/upload";

export const PREVIEW_ROW_COUNT = 10;
export const LISTED_PROBLEM_COUNT = 20;
const CHUNK_CHARACTERS = 64 * 1024;

/** What the browser has found in a CSV so far; `done` once the whole file has been read. */
export interface CsvCheck {
  /** The header cells as the file writes them. */
  fields: string[];
  previewRows: string[][];
  rowsRead: number;
  validRows: number;
  problemRows: number;
  /** The first problems found, at most LISTED_PROBLEM_COUNT of them. */
  problems: CsvRefusal[];
  problemCount: number;
  /** Set when the file cannot be read as a catalog CSV at all: what is wrong and what to do. */
  unreadable: string | null;
  /** True when the header row itself is wrong: no row can be read until it is fixed. */
  headerRefused: boolean;
  fraction: number;
  done: boolean;
}

const megabytes = (bytes: number) => (bytes / (1024 * 1024)).toFixed(1);

/** Why a chosen file cannot be imported at all, by the import's own rules, or null when it may be read. */
export function fileRefusal(file: File): string | null {
  const notCsv = notCsvFileMessage(file);
  if (notCsv) return notCsv;
  if (file.size > MAX_IMPORT_BYTES) {
    return `"${file.name}" is ${megabytes(file.size)} MB; the limit is ${MAX_IMPORT_SIZE_TEXT}. Split it into smaller CSV files and import them one by one.`;
  }
  if (file.size === 0) return `"${file.name}" is empty. Choose a CSV with a header row and at least one row.`;
  return null;
}

function noteProblems(check: CsvCheck, refusals: readonly CsvRefusal[]) {
  check.problemCount += refusals.length;
  const room = LISTED_PROBLEM_COUNT - check.problems.length;
  if (room > 0) check.problems.push(...refusals.slice(0, room));
}

/**
 * Checks one batch of rows with the server's own row reader and judge of brands and lines;
 * `firstLine` is the file line of its first row.
 */
function checkBatch(check: CsvCheck, columns: readonly string[], cells: string[][], firstLine: number, lineOfSku: Map<string, number>, judge: LineJudge) {
  const read = readCatalogRows(columns, cells, firstLine, lineOfSku);
  const refusals = [...read.refusals, ...judgeRowLines(read.rows, judge).refusals].sort((a, b) => a.line - b.line);
  const refusedRows = new Set(refusals.map((refusal) => refusal.line)).size;
  check.rowsRead += read.rowCount;
  check.problemRows += refusedRows;
  check.validRows += read.rowCount - refusedRows;
  noteProblems(check, refusals);
}

/**
 * Reads a CSV in chunks, reporting after each one and giving the page a turn to repaint in between.
 * Rows are judged against `lines`, the brands and lines the server judges them against. Line
 * numbers are those a spreadsheet shows, the header being line 1.
 */
export async function checkCsvFile(file: File, lines: CatalogLines, onProgress: (check: CsvCheck) => void, signal?: AbortSignal): Promise<CsvCheck> {
  const text = normalizeCsvText(await file.text());
  const check: CsvCheck = {
    fields: [], previewRows: [], rowsRead: 0, validRows: 0, problemRows: 0, problems: [], problemCount: 0,
    unreadable: null, headerRefused: false, fraction: 0, done: false,
  };
  const lineOfSku = new Map<string, number>();
  const judge = lineJudge(lines);
  let columns: string[] = [];
  let nextLine = 1;
  const snapshot = () => onProgress({ ...check, problems: [...check.problems], previewRows: [...check.previewRows] });

  return new Promise((resolve) => {
    Papa.parse<string[]>(text, {
      delimiter: ",",
      newline: "\n",
      chunkSize: CHUNK_CHARACTERS,
      chunk(results: Papa.ParseResult<string[]>, parser: Papa.Parser) {
        let cells = results.data;
        if (nextLine === 1) {
          check.fields = cells[0] ?? [];
          cells = cells.slice(1);
          nextLine = 2;
          const header = readCatalogHeader(check.fields);
          if (!header.ok) check.unreadable = `${header.problem}: ${EXPORT_AS_CSV}.`;
          else if (header.refusals.length > 0) {
            check.headerRefused = true;
            noteProblems(check, header.refusals);
          } else columns = header.columns;
          if (check.unreadable || check.headerRefused) return parser.abort();
        }
        if (results.errors.some((error) => error.type === "Quotes")) {
          check.unreadable = `A double quote (") opens a cell after line ${nextLine - 1} and never closes, so the file cannot be read to the end. Close the quote, or export the file again from the spreadsheet as CSV.`;
          return parser.abort();
        }
        checkBatch(check, columns, cells, nextLine, lineOfSku, judge);
        nextLine += cells.length;
        for (const row of cells) {
          if (check.previewRows.length >= PREVIEW_ROW_COUNT) break;
          if (!isSkippedRow(row)) check.previewRows.push(row);
        }
        check.fraction = Math.min(1, results.meta.cursor / Math.max(1, text.length));
        snapshot();
        if (signal?.aborted) return parser.abort();
        parser.pause();
        setTimeout(() => parser.resume(), 0);
      },
      complete() {
        check.done = true;
        check.fraction = 1;
        snapshot();
        resolve(check);
      },
    });
  });
}

const rowCount = (count: number) => `${formatInteger(count)} ${count === 1 ? "row" : "rows"}`;

/**
 * What the Import button will do, said on the button itself: how many rows it writes, or, when all
 * or nothing is chosen and some rows are refused, that nothing will be written. Sending such a file
 * anyway brings the server's own report of the refusals.
 */
export function importButtonText(check: Pick<CsvCheck, "rowsRead" | "validRows" | "problemRows">, mode: ImportMode): string {
  if (check.problemRows === 0) return `Import ${rowCount(check.rowsRead)}`;
  if (mode === "valid-rows") return `Import ${rowCount(check.validRows)}, skip ${formatInteger(check.problemRows)} refused`;
  const refused = check.problemRows === 1 ? "1 row is refused — fix it" : `${formatInteger(check.problemRows)} rows are refused — fix them`;
  return `Nothing will be written: ${refused} or choose 'import the valid rows'`;
}
