import { isCheckViolation } from "@/lib/database/unique-violation";
import { belowHeldRefusal } from "@/lib/offers/held-refusal";
import { and, eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, stockItem, tireLine } from "@/db/schema";
import type { ApiErrorCode } from "@/lib/api/errors";
import { asSentence, retiredLineReason, unknownBrandReason, unknownLineReason } from "@/lib/brands/line-words";
import { formatPrice } from "@/lib/money/money";
import { changedFields, recordAudit, type Actor } from "@/lib/audit/record";
import { ofBrand, ofLine } from "@/lib/catalog/columns";
import type { NewStockItemBody, StockItemChanges } from "./item-bodies";
import { buildStockRow, type StockItemInput, type StockLine, type StockRowProblem } from "./build-stock-row";
import { tireColumns, toTire, type Tire } from "@/lib/catalog/catalog-tire";

/** A refusal names the field to blame when there is one, so that a form can show it there. */
export type StockWriteResult = { ok: true; tire: Tire } | { ok: false; code: ApiErrorCode; message: string; field?: string };

const refuse = (code: ApiErrorCode, message: string, field?: string): StockWriteResult => ({ ok: false, code, message, field });
const refusedRow = (problem: StockRowProblem) =>
  problem.unmeasurable
    ? refuse("unreadable", `${problem.reason}.`, problem.field)
    : refuse("invalid_parameter", `The field "${problem.field}" is invalid: ${problem.reason}.`, problem.field);
const retiredLine = (line: FoundLine) => refuse("line_retired", asSentence(retiredLineReason(line.label)), "line");

/** Names the brand when the catalog has none by that name, else the line. */
async function unknownLine(db: Database, brandName: string, lineName: string): Promise<StockWriteResult> {
  const [known] = await db.select({ name: brand.name }).from(brand).where(sql`lower(${brand.name}) = lower(${brandName})`);
  return known
    ? refuse("unknown_line", asSentence(unknownLineReason(known.name, lineName)), "line")
    : refuse("unknown_line", asSentence(unknownBrandReason(brandName)), "brand");
}

const AUDITED_FIELDS = [
  "priceCents", "quantityOnHand", "designation", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "extraLoad", "lineId", "treadDepth32",
] as const;

const fieldLabels: Record<(typeof AUDITED_FIELDS)[number], string> = {
  priceCents: "price",
  quantityOnHand: "quantity",
  designation: "size",
  loadIndex: "load index",
  loadIndexDual: "dual load index",
  speedSymbol: "speed symbol",
  loadRange: "load range",
  extraLoad: "extra load",
  lineId: "line",
  treadDepth32: "tread depth (32nds)",
};

const shown = (field: string, value: unknown) => (value === null ? "none" : field === "priceCents" ? formatPrice(Number(value)) : String(value));

/** "price $159.00 → $149.00; quantity 4 → 2; line Ashlund Ivelle Tour → Ashlund Jorvane AT" */
function describeChanges(changes: ReturnType<typeof changedFields>, lines: { from: string; to: string }): string {
  return Object.entries(changes)
    .map(([field, { from, to }]) =>
      field === "lineId" ? `line ${lines.from} → ${lines.to}` : `${fieldLabels[field as keyof typeof fieldLabels] ?? field} ${shown(field, from)} → ${shown(field, to)}`,
    )
    .join("; ");
}

type FoundLine = StockLine & { label: string; retired: boolean };

/** A brand's line by name, in any letter case, with its names as the catalog spells them. */
async function findLine(db: Database, brandName: string, lineName: string): Promise<FoundLine | null> {
  const [line] = await db
    .select({ id: tireLine.id, runFlat: tireLine.runFlat, retired: tireLine.retired, label: sql<string>`${brand.name} || ' ' || ${tireLine.name}` })
    .from(tireLine)
    .innerJoin(brand, ofBrand)
    .where(and(sql`lower(${brand.name}) = lower(${brandName})`, sql`lower(${tireLine.name}) = lower(${lineName})`))
    .limit(1);
  return line ?? null;
}

/** A current (not retired) item as a Tire, with what an edit starts from (the count on the shelf, not what can be sold). */
async function findCurrent(db: Database, sku: string) {
  const [row] = await db
    .select({ ...tireColumns, quantityOnHand: stockItem.quantityOnHand, lineId: stockItem.lineId, lineRunFlat: tireLine.runFlat, lineRetired: tireLine.retired, ownTreadDepth32: stockItem.treadDepth32 })
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(and(eq(stockItem.sku, sku), eq(stockItem.retired, false)));
  return row ?? null;
}

async function currentTire(db: Database, sku: string): Promise<StockWriteResult> {
  const row = await findCurrent(db, sku);
  return row ? { ok: true, tire: toTire(row) } : refuse("not_found", `No current catalog item has the SKU "${sku}".`);
}

/** Adds an item to a line the catalog has and has not retired, through the same write path as the demo seed. */
export async function createStockItem(db: Database, body: NewStockItemBody, actor: Actor): Promise<StockWriteResult> {
  const { brand: brandName, line: lineName, treadDepth32 = null, ...input } = body;
  return db.transaction(async (tx) => {
    const line = await findLine(tx, brandName, lineName);
    if (!line) return unknownLine(tx, brandName, lineName);
    if (line.retired) return retiredLine(line);
    const built = buildStockRow(input, line);
    if (!built.ok) return refusedRow(built.problem);
    const row = { ...built.row, treadDepth32 };
    const inserted = await tx.insert(stockItem).values(row).onConflictDoNothing({ target: stockItem.sku }).returning({ id: stockItem.id });
    if (inserted.length === 0) return refuse("already_exists", `The SKU "${row.sku}" is taken (retired items keep theirs).`, "sku");
    const summary = `Added ${row.designation} (${brandName} ${lineName}) at ${formatPrice(row.priceCents)}, ${row.quantityOnHand} on hand`;
    await recordAudit(tx, actor, [{ action: "item_added", subject: row.sku, summary }]);
    return currentTire(tx, row.sku);
  });
}

/**
 * Changes a current item; the row is rebuilt and checked as a whole, as if it were new. An item may
 * stay on a retired line (its stock is still sold) but not move onto one.
 */
export async function updateStockItem(db: Database, sku: string, changes: StockItemChanges, actor: Actor): Promise<StockWriteResult> {
  try {
    return await writeItemChanges(db, sku, changes, actor);
  } catch (error) {
    // The database keeps the held count within what is on hand: name the fittings that hold the tires.
    if (isCheckViolation(error, "stock_item_held")) return refuse("held_for_fittings", await belowHeldRefusal(db, sku), "quantity");
    throw error;
  }
}

function writeItemChanges(db: Database, sku: string, changes: StockItemChanges, actor: Actor): Promise<StockWriteResult> {
  return db.transaction(async (tx) => {
    const current = await findCurrent(tx, sku);
    if (!current) return refuse("not_found", `No current catalog item has the SKU "${sku}".`);
    const brandName = changes.brand ?? current.brand;
    const lineName = changes.line ?? current.line;
    const currentLabel = `${current.brand} ${current.line}`;
    const line = changes.brand || changes.line ? await findLine(tx, brandName, lineName) : { id: current.lineId, runFlat: current.lineRunFlat, label: currentLabel, retired: current.lineRetired };
    if (!line) return unknownLine(tx, brandName, lineName);
    if (line.id !== current.lineId && line.retired) return retiredLine(line);
    const input: StockItemInput = {
      sku,
      designation: changes.designation ?? current.designation,
      loadIndex: changes.loadIndex ?? current.loadIndex,
      loadIndexDual: changes.loadIndexDual === undefined ? current.loadIndexDual : changes.loadIndexDual,
      speedSymbol: changes.speedSymbol ?? current.speedSymbol,
      loadRange: changes.loadRange === undefined ? current.loadRange : changes.loadRange,
      extraLoad: changes.extraLoad ?? current.extraLoad,
      priceCents: changes.priceCents ?? current.priceCents,
      quantity: changes.quantity ?? current.quantityOnHand,
    };
    const built = buildStockRow(input, line);
    if (!built.ok) return refusedRow(built.problem);
    const row = { ...built.row, treadDepth32: changes.treadDepth32 === undefined ? current.ownTreadDepth32 : changes.treadDepth32 };
    await tx.update(stockItem).set({ ...row, updatedAt: new Date() }).where(eq(stockItem.sku, sku));
    const before = { ...current, treadDepth32: current.ownTreadDepth32 };
    const audited = changedFields(before, { ...before, ...row }, AUDITED_FIELDS);
    if (Object.keys(audited).length > 0) {
      await recordAudit(tx, actor, [{ action: "item_changed", subject: sku, summary: describeChanges(audited, { from: currentLabel, to: line.label }), changes: audited }]);
    }
    return currentTire(tx, sku);
  });
}

/** Retires an item: it leaves the catalog and the finder but keeps its row (and its SKU). */
export async function retireStockItem(db: Database, sku: string, actor: Actor): Promise<boolean> {
  return db.transaction(async (tx) => {
    const retired = await tx
      .update(stockItem)
      .set({ retired: true, updatedAt: new Date() })
      .where(and(eq(stockItem.sku, sku), eq(stockItem.retired, false)))
      .returning({ designation: stockItem.designation });
    const [item] = retired;
    if (!item) return false;
    await recordAudit(tx, actor, [{ action: "item_retired", subject: sku, summary: `Retired ${item.designation}` }]);
    return true;
  });
}
