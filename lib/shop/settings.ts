import { asc, eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { shop, type AuditChanges } from "@/db/schema";
import { recordAudit, type Actor } from "@/lib/audit/record";
import { WEEKDAYS, type WeeklyHours } from "@/lib/tire";
import { contactColumns } from "./queries";
import { applySettingsChanges, describeSettingChanges, settingChanges, type SettingChange } from "./settings-changes";
import type { ShopSettings, ShopSettingsChanges } from "./settings-schema";

const settingsColumns = {
  id: shop.id,
  ...contactColumns,
  timeZone: shop.timeZone,
  hours: shop.hours,
  closedDates: shop.closedDates,
  tolerancePct: shop.defaultTolerancePct,
  fittingPerTireCents: shop.fittingPerTireCents,
  disposalPerTireCents: shop.disposalPerTireCents,
  tireFeePerTireCents: shop.tireFeePerTireCents,
  taxRateBp: shop.taxRateBp,
  taxServices: shop.taxServices,
  fittingBays: shop.fittingBays,
  fittingMinutes: shop.fittingMinutes,
  leadMinutes: shop.leadMinutes,
  cancelCutoffHours: shop.cancelCutoffHours,
  wearLimit32: shop.wearLimit32,
};

type SettingsRow = { [K in keyof typeof settingsColumns]: (typeof settingsColumns)[K]["_"]["data"] };

function settingsOf(row: SettingsRow): ShopSettings {
  const { name, streetAddress, town, region, postalCode, phone, email, timeZone, hours, closedDates, tolerancePct } = row;
  const { fittingPerTireCents, disposalPerTireCents, tireFeePerTireCents, taxRateBp, taxServices } = row;
  const { fittingBays, fittingMinutes, leadMinutes, cancelCutoffHours, wearLimit32 } = row;
  // jsonb keeps an object's keys in its own order: answer the week Monday first.
  const week = Object.fromEntries(WEEKDAYS.map((day) => [day, hours[day] ?? []])) as WeeklyHours;
  return {
    name, address: { streetAddress, town, region, postalCode }, phone, email, timeZone, hours: week, closedDates, tolerancePct,
    fittingPerTireCents, disposalPerTireCents, tireFeePerTireCents, taxRateBp, taxServices,
    fittingBays, fittingMinutes, leadMinutes, cancelCutoffHours, wearLimit32,
  };
}

function columnsOf({ address, tolerancePct, ...rest }: ShopSettings) {
  return { ...rest, ...address, defaultTolerancePct: tolerancePct };
}

export const SHOP_NOT_SET_UP = "The shop has not been set up yet: its row is added by the demo seed (DEMO_SEED=on) or by hand.";

/** The shop's settings as GET /api/v1/shop answers them; null before the shop has been set up. */
export async function readShopSettings(db: Database): Promise<ShopSettings | null> {
  const [row] = await db.select(settingsColumns).from(shop).orderBy(asc(shop.id)).limit(1);
  return row ? settingsOf(row) : null;
}

export type SettingsUpdate = { ok: true; settings: ShopSettings; changes: SettingChange[] } | { ok: false; code: "not_found"; message: string };

/**
 * Applies a PATCH (already validated) in one transaction with its audit entry: the row is locked,
 * the changes merged, and only the settings whose values differ are written and recorded. A change
 * that changes nothing writes nothing.
 */
export async function updateShopSettings(db: Database, actor: Actor, changes: ShopSettingsChanges): Promise<SettingsUpdate> {
  return db.transaction(async (tx) => {
    const [row] = await tx.select(settingsColumns).from(shop).orderBy(asc(shop.id)).limit(1).for("update");
    if (!row) return { ok: false, code: "not_found", message: SHOP_NOT_SET_UP };
    const before = settingsOf(row);
    const after = applySettingsChanges(before, changes);
    const changed = settingChanges(before, after);
    if (changed.length === 0) return { ok: true, settings: before, changes: [] };
    await tx.update(shop).set({ ...columnsOf(after), updatedAt: sql`now()` }).where(eq(shop.id, row.id));
    const audited: AuditChanges = Object.fromEntries(changed.map(({ field, from, to }) => [field, { from, to }]));
    const summary = describeSettingChanges(changed);
    await recordAudit(tx, actor, [
      { action: "shop_changed", subject: after.name, summary: `${summary.charAt(0).toUpperCase()}${summary.slice(1)}`, changes: audited },
    ]);
    return { ok: true, settings: after, changes: changed };
  });
}
