import { and, eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand, tireLine } from "@/db/schema";
import { changedFields, recordAudit, type Actor } from "@/lib/audit/record";
import { ofBrand } from "@/lib/catalog/columns";
import { isUniqueViolation } from "@/lib/database/unique-violation";
import type { LineAnswer, LineChanges, NewLineBody } from "./brand-bodies";
import { refuse, type CatalogNameWrite } from "./brand-writes";
import { listedLineColumns } from "./queries";

/** A line as the API answers a write: as listed, with its brand's id. */
const lineColumns = { ...listedLineColumns, brandId: tireLine.brandId };

const LINE_FIELDS = ["name", "season", "terrain", "threePeak", "treadDepth32", "retired"] as const;
const FIELD_WORDS: Record<(typeof LINE_FIELDS)[number], string> = {
  name: "name",
  season: "season",
  terrain: "terrain",
  threePeak: "3PMSF",
  treadDepth32: "tread depth",
  retired: "retired",
};

const depthWords = (depth: unknown) => (depth === null ? "unknown" : `${String(depth)}/32 in`);
const valueWords = (field: (typeof LINE_FIELDS)[number], value: unknown) =>
  field === "treadDepth32" ? depthWords(value) : typeof value === "boolean" ? (value ? "yes" : "no") : String(value);

/** "all-season, highway, 3PMSF, tread depth 10/32 in" */
const describeLine = (line: LineAnswer) =>
  [line.season, line.terrain, ...(line.threePeak ? ["3PMSF"] : []), `tread depth ${depthWords(line.treadDepth32)}`].join(", ");

/** The brand's line already called this, in any letter case, as the catalog spells them. */
async function lineNameTaken(db: Database, brandId: number, name: string) {
  const [found] = await db
    .select({ brand: brand.name, line: tireLine.name })
    .from(tireLine)
    .innerJoin(brand, ofBrand)
    .where(and(eq(tireLine.brandId, brandId), sql`lower(${tireLine.name}) = lower(${name})`));
  const owner = found ? `The brand ${found.brand}` : "This brand";
  return refuse("already_exists", `${owner} already has a line called “${found?.line ?? name}”. Line names are compared without letter case.`, "name");
}

/** Adds a line to a brand; the database's unique index on the brand and the name, in any case, refuses a second one. */
export async function createLine(db: Database, brandId: number, body: NewLineBody, actor: Actor): Promise<CatalogNameWrite<LineAnswer>> {
  try {
    return await db.transaction(async (tx) => {
      const [owner] = await tx.select({ name: brand.name }).from(brand).where(eq(brand.id, brandId));
      if (!owner) return refuse("not_found", `No brand has the id ${brandId}.`);
      const [created] = await tx
        .insert(tireLine)
        .values({ ...body, brandId, treadDepth32: body.treadDepth32 ?? null })
        .returning(lineColumns);
      const label = `${owner.name} ${created!.name}`;
      await recordAudit(tx, actor, [{ action: "line_added", subject: label, summary: `Added the line ${label}: ${describeLine(created!)}` }]);
      return { ok: true as const, value: created! };
    });
  } catch (error) {
    if (isUniqueViolation(error)) return lineNameTaken(db, brandId, body.name);
    throw error;
  }
}

/** Changes a line's name or what it is made for, or retires it (it takes no new items) or brings it back. */
export async function updateLine(db: Database, id: number, changes: LineChanges, actor: Actor): Promise<CatalogNameWrite<LineAnswer>> {
  let brandId: number | undefined;
  try {
    return await db.transaction(async (tx) => {
      const [current] = await tx
        .select({ ...lineColumns, brandName: brand.name })
        .from(tireLine)
        .innerJoin(brand, ofBrand)
        .where(eq(tireLine.id, id))
        .for("update", { of: tireLine });
      if (!current) return refuse("not_found", `No line has the id ${id}.`);
      brandId = current.brandId;
      const [updated] = await tx.update(tireLine).set(changes).where(eq(tireLine.id, id)).returning(lineColumns);
      const audited = changedFields(current, updated!, LINE_FIELDS);
      const changed = Object.keys(audited) as (typeof LINE_FIELDS)[number][];
      if (changed.length > 0) {
        const label = `${current.brandName} ${updated!.name}`;
        const summary =
          changed.length === 1 && changed[0] === "retired"
            ? `${updated!.retired ? "Retired" : "Un-retired"} the line ${label}`
            : `Changed the line ${label}: ${changed.map((field) => `${FIELD_WORDS[field]} ${valueWords(field, audited[field]!.from)} → ${valueWords(field, audited[field]!.to)}`).join("; ")}`;
        await recordAudit(tx, actor, [{ action: "line_changed", subject: label, summary, changes: audited }]);
      }
      return { ok: true as const, value: updated! };
    });
  } catch (error) {
    if (isUniqueViolation(error) && brandId !== undefined && changes.name !== undefined) return lineNameTaken(db, brandId, changes.name);
    throw error;
  }
}
