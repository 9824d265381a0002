import { sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockFitment, stockItem, type NewStockItem } from "@/db/schema";
import { yieldToEventLoop } from "./event-loop";
import type { ImportPlan } from "./import-plan";

/** The catalog changed between an import's plan and its write: the write is undone and planned again. */
export class CatalogMovedError extends Error {
  constructor() {
    super("the catalog changed while the import was planned");
  }
}

// Under 100 ms of work per statement on the embedded database over a busy disk, so requests that need
// no database are answered between them; JSON keeps each statement to one parameter.
const ROWS_PER_STATEMENT = 250;

/** The columns an import writes: everything buildStockRow sets, and the fitment found for it. */
const WRITTEN_COLUMNS = [
  "sku", "lineId", "designation", "sizeKind", "prefix", "sectionWidthMm", "aspectRatio", "rimDiameterIn", "construction", "zr",
  "commercial", "runFlat", "loadIndex", "loadIndexDual", "speedSymbol", "speedRank", "loadRange", "loadRangePly", "extraLoad",
  "serviceType", "overallDiameterMm", "priceCents", "quantityOnHand", "fitmentId",
] as const satisfies readonly (keyof NewStockItem)[];

/** The facts a fitment stands for (db/migrations 0006, 0007). */
const FITMENT_FACTS = [
  "rimDiameterIn", "serviceType", "construction", "runFlat", "overallDiameterMm", "loadIndex", "loadIndexDual", "speedRank", "loadRangePly",
] as const satisfies readonly (keyof NewStockItem & keyof typeof stockFitment.$inferSelect)[];

type Facts = Pick<NewStockItem, (typeof FITMENT_FACTS)[number]>;

const snakeCase = (name: string) => name.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`);
const quoted = (names: readonly string[]) => sql.raw(names.map((name) => `"${snakeCase(name)}"`).join(", "));
const columnList = quoted(WRITTEN_COLUMNS);
const factList = quoted(FITMENT_FACTS);
const updateList = sql.raw(
  [...WRITTEN_COLUMNS.filter((column) => column !== "sku").map((column) => `"${snakeCase(column)}" = "incoming"."${snakeCase(column)}"`), `"updated_at" = now()`].join(", "),
);
const factsKey = (facts: Facts) => JSON.stringify(FITMENT_FACTS.map((fact) => facts[fact] ?? null));
const record = (row: NewStockItem, fitmentId: number, extra: Record<string, unknown> = {}) =>
  Object.fromEntries([...WRITTEN_COLUMNS.map((column) => [snakeCase(column), column === "fitmentId" ? fitmentId : (row[column] ?? null)]), ...Object.entries(extra)]);

/** An import's writes, made ready outside its transaction: JSON for each statement. */
export interface PreparedWrites {
  inserts: { json: string; count: number }[];
  updates: { json: string; count: number }[];
}

/**
 * The fitment of every row to write: every fitment's id is read in one query, and the facts no
 * fitment holds yet get one (a fitment with no items is one the finder passes over).
 */
async function fitmentIds(db: Database, rows: readonly NewStockItem[]): Promise<Map<string, number>> {
  const fitmentColumns = { id: stockFitment.id, ...Object.fromEntries(FITMENT_FACTS.map((fact) => [fact, stockFitment[fact]])) };
  const keyed = (fitments: { id: number }[]) => fitments.map((fitment) => [factsKey(fitment as unknown as Facts), fitment.id] as const);
  const ids = new Map(keyed(await db.select(fitmentColumns).from(stockFitment)));
  const missing = new Map(rows.filter((row) => !ids.has(factsKey(row))).map((row) => [factsKey(row), row]));
  if (missing.size === 0) return ids;
  await yieldToEventLoop();
  const records = [...missing.values()].map((row) => Object.fromEntries(FITMENT_FACTS.map((fact) => [snakeCase(fact), row[fact] ?? null])));
  // Another writer may add the same facts meanwhile: theirs is taken, and the next read finds it.
  await db.execute(sql`
    insert into ${stockFitment} (${factList}) select ${factList} from json_populate_recordset(null::stock_fitment, ${JSON.stringify(records)}::json)
    on conflict on constraint stock_fitment_facts do nothing`);
  await yieldToEventLoop();
  return new Map(keyed(await db.select(fitmentColumns).from(stockFitment)));
}

function chunks<T>(items: readonly T[], toRecord: (item: T) => Record<string, unknown>) {
  const prepared: { json: string; count: number }[] = [];
  for (let start = 0; start < items.length; start += ROWS_PER_STATEMENT) {
    const slice = items.slice(start, start + ROWS_PER_STATEMENT);
    prepared.push({ json: JSON.stringify(slice.map(toRecord)), count: slice.length });
  }
  return prepared;
}

/** Resolves the fitments of a plan's rows and writes each statement's JSON, before any transaction starts. */
export async function prepareWrites(db: Database, plan: ImportPlan): Promise<PreparedWrites> {
  const ids = await fitmentIds(db, [...plan.added, ...plan.updated.map((update) => update.row)]);
  const idOf = (row: NewStockItem) => ids.get(factsKey(row))!;
  return {
    inserts: chunks(plan.added, (row) => record(row, idOf(row))),
    updates: chunks(plan.updated, ({ row, version }) => record(row, idOf(row), { planned_version: version })),
  };
}

const writtenCount = async (db: Database, statement: ReturnType<typeof sql>) =>
  ((await db.execute(sql`with "written" as (${statement} returning 1) select count(*)::int as "count" from "written"`)) as unknown as { rows: { count: number }[] }).rows[0]!.count;

/**
 * Writes the planned rows in short statements, yielding between them. Each statement must write
 * exactly its rows: a new SKU someone added meanwhile, or an item changed or retired since it was
 * planned (its row version differs), throws CatalogMovedError, which undoes the transaction.
 */
export async function applyWrites(tx: Database, writes: PreparedWrites): Promise<void> {
  for (const { json, count } of writes.inserts) {
    const inserted = await writtenCount(tx, sql`
      insert into ${stockItem} (${columnList}) select ${columnList} from json_populate_recordset(null::stock_item, ${json}::json)
      on conflict (sku) do nothing`);
    if (inserted !== count) throw new CatalogMovedError();
    await yieldToEventLoop();
  }
  for (const { json, count } of writes.updates) {
    const updated = await writtenCount(tx, sql`
      update ${stockItem} set ${updateList}
      from (select "item".*, "element"->>'planned_version' as "planned_version"
            from json_array_elements(${json}::json) as "element", json_populate_record(null::stock_item, "element") as "item") as "incoming"
      where ${stockItem.sku} = "incoming"."sku" and not ${stockItem.retired} and ${stockItem}.xmin::text = "incoming"."planned_version"`);
    if (updated !== count) throw new CatalogMovedError();
    await yieldToEventLoop();
  }
}
