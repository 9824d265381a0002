import type { CsvRefusal } from "./columns";
import { yieldToEventLoop } from "./event-loop";
import { FIRST_DATA_LINE, openCatalogCsv, readCatalogRows, type CatalogCsvFile } from "./read-file";
import type { CatalogCsvRow } from "./read-row";

// About 25 ms of reading at a time on the slowest machine it runs on.
const ROWS_PER_STEP = 500;

/**
 * readCatalogCsv for the server: the same reading and the same answer, in batches of rows with the
 * event loop free between them, so that the site goes on answering while a large file is read.
 */
export async function readCatalogCsvInSteps(fileText: string): Promise<CatalogCsvFile> {
  const opened = openCatalogCsv(fileText);
  if ("read" in opened) return opened.read;
  const rows: CatalogCsvRow[] = [];
  const refusals: CsvRefusal[] = [];
  let rowCount = 0;
  const lineOfSku = new Map<string, number>();
  for (let from = 0; from < opened.dataRows.length; from += ROWS_PER_STEP) {
    await yieldToEventLoop();
    const batch = readCatalogRows(opened.columns, opened.dataRows.slice(from, from + ROWS_PER_STEP), FIRST_DATA_LINE + from, lineOfSku);
    rows.push(...batch.rows);
    refusals.push(...batch.refusals);
    rowCount += batch.rowCount;
  }
  return { ok: true, rows, refusals, headerRefused: false, rowCount };
}
