import { eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand } from "@/db/schema";
import type { ApiErrorCode } from "@/lib/api/errors";
import { recordAudit, type Actor } from "@/lib/audit/record";
import { isUniqueViolation } from "@/lib/database/unique-violation";
import type { BrandAnswer, BrandNameBody } from "./brand-bodies";

/** A write's outcome; a refusal names the field to blame, so that a form can show it there. */
export type CatalogNameWrite<T> = { ok: true; value: T } | { ok: false; code: ApiErrorCode; message: string; field?: string };

export const refuse = (code: ApiErrorCode, message: string, field?: string) => ({ ok: false as const, code, message, field });

/** The brand already called this, in any letter case, as the catalog spells it. */
async function brandCalled(db: Database, name: string): Promise<string> {
  const [found] = await db.select({ name: brand.name }).from(brand).where(sql`lower(${brand.name}) = lower(${name})`);
  return found?.name ?? name;
}

const nameTaken = async (db: Database, name: string) =>
  refuse("already_exists", `Another brand is already called “${await brandCalled(db, name)}”. Brand names are compared without letter case.`, "name");

/** Adds a brand; the database's unique index on its name, in any case, refuses a second one. */
export async function createBrand(db: Database, { name }: BrandNameBody, actor: Actor): Promise<CatalogNameWrite<BrandAnswer>> {
  try {
    return await db.transaction(async (tx) => {
      const [created] = await tx.insert(brand).values({ name }).returning({ id: brand.id, name: brand.name });
      await recordAudit(tx, actor, [{ action: "brand_added", subject: created!.name, summary: `Added the brand ${created!.name}` }]);
      return { ok: true as const, value: created! };
    });
  } catch (error) {
    if (isUniqueViolation(error)) return nameTaken(db, name);
    throw error;
  }
}

/** Renames a brand; its lines and items follow, since they refer to it by id. */
export async function renameBrand(db: Database, id: number, { name }: BrandNameBody, actor: Actor): Promise<CatalogNameWrite<BrandAnswer>> {
  try {
    return await db.transaction(async (tx) => {
      const [current] = await tx.select({ name: brand.name }).from(brand).where(eq(brand.id, id)).for("update");
      if (!current) return refuse("not_found", `No brand has the id ${id}.`);
      if (current.name !== name) {
        await tx.update(brand).set({ name }).where(eq(brand.id, id));
        await recordAudit(tx, actor, [
          { action: "brand_renamed", subject: name, summary: `Renamed the brand ${current.name} → ${name}`, changes: { name: { from: current.name, to: name } } },
        ]);
      }
      return { ok: true as const, value: { id, name } };
    });
  } catch (error) {
    if (isUniqueViolation(error)) return nameTaken(db, name);
    throw error;
  }
}
