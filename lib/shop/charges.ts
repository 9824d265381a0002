import { asc } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { shop } from "@/db/schema";
import { schemaOf } from "@/lib/api/schema-match";
import type { Estimate, ShopCharges } from "@/lib/money/estimate";
import { DEFAULT_WEAR_LIMIT_32 } from "@/lib/tire/wear-match";
import { FALLBACK_TOLERANCE_PCT } from "./tolerance";

/** What a shop not yet set up charges beyond the tires: nothing, and no tax. */
export const NO_CHARGES: ShopCharges = { fittingPerTireCents: 0, disposalPerTireCents: 0, tireFeePerTireCents: 0, taxRateBp: 0, taxServices: false };

const chargeColumns = {
  fittingPerTireCents: shop.fittingPerTireCents,
  disposalPerTireCents: shop.disposalPerTireCents,
  tireFeePerTireCents: shop.tireFeePerTireCents,
  taxRateBp: shop.taxRateBp,
  taxServices: shop.taxServices,
};

/** The shop's charges per tire and its sales tax, in one query; nothing charged before the shop has been set up. */
export async function readShopCharges(db: Database): Promise<ShopCharges> {
  const [row] = await db.select(chargeColumns).from(shop).orderBy(asc(shop.id)).limit(1);
  return row ?? NO_CHARGES;
}

export interface FinderShopSettings {
  tolerancePct: number;
  /** Wear match's limit when a vehicle maker states none, in 32nds of an inch. */
  wearLimit32: number;
  charges: ShopCharges;
}

/**
 * What a finder search reads of the shop, in one query (a search runs in a few milliseconds, and a
 * round trip is a good part of one): its default tolerance, Wear match's default limit and its charges.
 */
export async function readFinderShopSettings(db: Database): Promise<FinderShopSettings> {
  const [row] = await db
    .select({ tolerancePct: shop.defaultTolerancePct, wearLimit32: shop.wearLimit32, ...chargeColumns })
    .from(shop)
    .orderBy(asc(shop.id))
    .limit(1);
  if (!row) return { tolerancePct: FALLBACK_TOLERANCE_PCT, wearLimit32: DEFAULT_WEAR_LIMIT_32, charges: NO_CHARGES };
  const { tolerancePct, wearLimit32, ...charges } = row;
  return { tolerancePct, wearLimit32, charges };
}

const cents = (what: string) => z.number().int().min(0).describe(what);

/** An estimate as the API answers it (lib/money/estimate.ts computes it). */
export const estimateSchema = schemaOf<Estimate>()(
  z
    .object({
      quantity: z.number().int().min(1).describe("How many tires the estimate is for."),
      tiresCents: cents("The tires: price × quantity, in US cents."),
      servicesCents: cents("Fitting (mounting and balancing) × quantity."),
      feesCents: cents("Disposal of the old tires and the per-tire fee, × quantity."),
      taxCents: cents("Sales tax on the tires (and on fitting and disposal where the shop taxes services; never on the tire fee), rounded half-up once."),
      totalCents: cents("tiresCents + servicesCents + feesCents + taxCents."),
    })
    .describe("What the set costs out the door, from the shop's charges: an estimate, which the shop confirms."),
);
