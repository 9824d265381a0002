import type { Database } from "@/db/client";
import { recordAudit, type Actor } from "@/lib/audit/record";
import { formatCount } from "@/lib/format/format";
import type { CsvRefusal } from "./columns";
import { planImport, readCatalogLines } from "./import-plan";
import type { CatalogImportReport, ImportMode } from "./import-report";
import { applyWrites, CatalogMovedError, prepareWrites } from "./import-write";
import { judgeRowLines, lineJudge } from "./judge-lines";
import { readCatalogCsvInSteps } from "./read-file-in-steps";

export type CatalogImportResult = { ok: true; report: CatalogImportReport } | { ok: false; message: string };

const byLine = (a: CsvRefusal, b: CsvRefusal) => a.line - b.line;

// Planning again after the catalog changed underneath; more than this many changes in a row is a busy Counter, told to try again.
const ATTEMPTS = 3;

const CATALOG_BUSY = "The catalog changed while this file was imported, so nothing was written: import the file again.";

/**
 * Imports a catalog CSV. In all-or-nothing mode a single refused row means nothing is written, and
 * the report says what would have been; in valid-rows mode the rows that pass are written. A wrong
 * header refuses the whole file in either mode. One audit entry records an import that wrote anything.
 *
 * The file is read, judged and planned against the catalog in short steps with the site's other
 * requests answered between them; only the write holds a transaction, in which every row is written
 * (or none: the catalog changes all at once). The write changes only what the plan saw: should an
 * item have changed or appeared since (a hold booked, a price edited), the transaction is undone and
 * the file planned again. A row the plan found identical to its item is not written, so an edit made
 * to it meanwhile stands, as if made just after the import.
 */
export async function importCatalogCsv(
  db: Database,
  file: { name: string; text: string },
  mode: ImportMode,
  actor: Actor,
): Promise<CatalogImportResult> {
  const read = await readCatalogCsvInSteps(file.text);
  if (!read.ok) return read;
  if (read.headerRefused) return { ok: true, report: { added: 0, updated: 0, unchanged: 0, refused: read.refusals, written: false } };

  for (let attempt = 1; attempt <= ATTEMPTS; attempt++) {
    const lines = judgeRowLines(read.rows, lineJudge(await readCatalogLines(db)));
    const plan = await planImport(db, lines.lined);
    const refused = [...read.refusals, ...lines.refusals, ...plan.refusals].sort(byLine);
    const written = plan.added.length + plan.updated.length > 0 && (refused.length === 0 || mode === "valid-rows");
    const report = { added: plan.added.length, updated: plan.updated.length, unchanged: plan.unchanged, refused, written };
    if (!written) return { ok: true, report };

    const writes = await prepareWrites(db, plan);
    const summary =
      `Imported ${formatCount(read.rowCount)} rows: ${formatCount(plan.added.length)} added, ${formatCount(plan.updated.length)} updated, ` +
      `${formatCount(plan.unchanged)} unchanged, ${formatCount(new Set(refused.map((refusal) => refusal.line)).size)} refused`;
    try {
      await db.transaction(async (tx) => {
        await applyWrites(tx, writes);
        await recordAudit(tx, actor, [{ action: "catalog_import", subject: file.name, summary }]);
      });
      return { ok: true, report };
    } catch (error) {
      if (!(error instanceof CatalogMovedError)) throw error;
    }
  }
  return { ok: false, message: CATALOG_BUSY };
}
