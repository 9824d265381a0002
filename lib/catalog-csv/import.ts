import { isCheckViolation } from "@/lib/database/unique-violation";
import { sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem, type NewStockItem } from "@/db/schema";
import { recordAudit, type Actor } from "@/lib/audit/record";
import type { CsvRefusal } from "./columns";
import { planImport, readCatalogLines } from "./import-plan";
import { judgeRowLines, lineJudge } from "./judge-lines";
import type { CatalogImportReport, ImportMode } from "./import-report";
import { readCatalogCsv } from "./read-file";
import { formatCount } from "@/lib/format/format";

export type CatalogImportResult = { ok: true; report: CatalogImportReport } | { ok: false; message: string };

// A few thousand rows per statement keep each JSON parameter to a megabyte or two.
const ROWS_PER_STATEMENT = 5000;

/** The columns an import writes: everything buildStockRow sets. */
const WRITTEN_COLUMNS = [
  "sku", "lineId", "designation", "sizeKind", "prefix", "sectionWidthMm", "aspectRatio", "rimDiameterIn", "construction", "zr",
  "commercial", "runFlat", "loadIndex", "loadIndexDual", "speedSymbol", "speedRank", "loadRange", "loadRangePly", "extraLoad",
  "serviceType", "overallDiameterMm", "priceCents", "quantityOnHand",
] as const satisfies readonly (keyof NewStockItem)[];

const snakeCase = (name: string) => name.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`);
const columnList = sql.raw(WRITTEN_COLUMNS.map((column) => `"${snakeCase(column)}"`).join(", "));
const updateList = sql.raw(
  [...WRITTEN_COLUMNS.filter((column) => column !== "sku").map((column) => `"${snakeCase(column)}" = excluded."${snakeCase(column)}"`), `"updated_at" = now()`].join(", "),
);

/**
 * Adds new SKUs and rewrites changed ones. The rows travel as one JSON parameter per statement,
 * which PGlite reads about three times faster than tens of thousands of separate parameters. A row
 * whose SKU was retired meanwhile is left alone: retired items keep their last state.
 */
async function upsertStockRows(db: Database, rows: readonly NewStockItem[]): Promise<void> {
  for (let start = 0; start < rows.length; start += ROWS_PER_STATEMENT) {
    const records = rows
      .slice(start, start + ROWS_PER_STATEMENT)
      .map((row) => Object.fromEntries(WRITTEN_COLUMNS.map((column) => [snakeCase(column), row[column] ?? null])));
    await db.execute(sql`
      insert into ${stockItem} (${columnList})
      select ${columnList} from json_populate_recordset(null::stock_item, ${JSON.stringify(records)}::json)
      on conflict (sku) do update set ${updateList} where not "stock_item"."retired"`);
  }
}

const byLine = (a: CsvRefusal, b: CsvRefusal) => a.line - b.line;

/**
 * Imports a catalog CSV in one transaction. In all-or-nothing mode a single refused row means
 * nothing is written, and the report says what would have been; in valid-rows mode the rows that
 * pass are written. A wrong header refuses the whole file in either mode. One audit entry records
 * an import that wrote anything.
 */
export async function importCatalogCsv(
  db: Database,
  file: { name: string; text: string },
  mode: ImportMode,
  actor: Actor,
): Promise<CatalogImportResult> {
  const read = readCatalogCsv(file.text);
  if (!read.ok) return read;
  if (read.headerRefused) return { ok: true, report: { added: 0, updated: 0, unchanged: 0, refused: read.refusals, written: false } };

  // A hold booked between the plan and the write fails the held check (stock_item_held): plan again once, and the row is refused.
  const importOnce = () => db.transaction(async (tx): Promise<CatalogImportReport> => {
    const lines = judgeRowLines(read.rows, lineJudge(await readCatalogLines(tx)));
    const plan = await planImport(tx, lines.lined);
    const refused = [...read.refusals, ...lines.refusals, ...plan.refusals].sort(byLine);
    const changes = [...plan.added, ...plan.updated];
    const written = changes.length > 0 && (refused.length === 0 || mode === "valid-rows");
    if (written) {
      await upsertStockRows(tx, changes);
      const summary =
        `Imported ${formatCount(read.rowCount)} rows: ${formatCount(plan.added.length)} added, ${formatCount(plan.updated.length)} updated, ` +
        `${formatCount(plan.unchanged)} unchanged, ${formatCount(new Set(refused.map((refusal) => refusal.line)).size)} refused`;
      await recordAudit(tx, actor, [{ action: "catalog_import", subject: file.name, summary }]);
    }
    return { added: plan.added.length, updated: plan.updated.length, unchanged: plan.unchanged, refused, written };
  });
  const report = await importOnce().catch((error: unknown) => {
    if (isCheckViolation(error, "stock_item_held")) return importOnce();
    throw error;
  });
  return { ok: true, report };
}
