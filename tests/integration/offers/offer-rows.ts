import { eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { offer, offerLine, quoteRequest, shop, stockItem } from "@/db/schema";
import { demoShop } from "@/lib/demo/shop";
import { seedFixture } from "../catalog/fixtures";

/** 4 × $182.99 with the demo shop's charges (worked in tests/unit/money/estimate.test.ts). */
export const FOUR_AT_182_99 = { quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 6_148, totalCents: 91_344 };

/** The demo shop (America/New_York), one stocked tire and one driver's request, as an offer needs them. */
export async function seedOfferWorld(db: Database): Promise<{ requestId: number; stockItemId: number }> {
  await db.insert(shop).values(demoShop);
  await seedFixture(db, [{ sku: "OF-225", designation: "225/65R17", loadIndex: 102, speedSymbol: "H", priceCents: 18_299, quantity: 8 }]);
  const [item] = await db.select({ id: stockItem.id }).from(stockItem).where(eq(stockItem.sku, "OF-225"));
  const [request] = await db
    .insert(quoteRequest)
    .values({ name: "Rosa Iverley", email: "rosa@example.test", phone: "+1 555 014 2233", vehicle: "2019 family SUV", tires: "225/65R17 102H", quantity: 4, source: "finder" })
    .returning({ id: quoteRequest.id });
  return { requestId: request!.id, stockItemId: item!.id };
}

interface OfferRow {
  requestId: number;
  stockItemId: number;
  token: string;
  status?: "open" | "accepted" | "withdrawn" | "cancelled" | "fitted";
  /** A fitting start (it lasts an hour, on bay 1); the hold runs to the end of that local day. */
  fittingStart?: string;
  holdUntil?: string;
  calendarSequence?: number;
}

/** Inserts an offer of four OF-225 tires, valid until 2026-12-03 in New York, with a fitting when given. */
export async function insertOffer(db: Database, row: OfferRow): Promise<number> {
  const start = row.fittingStart ? new Date(row.fittingStart) : null;
  const [made] = await db
    .insert(offer)
    .values({
      token: row.token,
      requestId: row.requestId,
      status: row.status ?? (start ? "accepted" : "open"),
      validUntilDate: "2026-12-03",
      validUntil: new Date("2026-12-04T05:00:00Z"),
      message: "We have these on the rack.",
      estimate: FOUR_AT_182_99,
      fittingBay: start ? 1 : null,
      fittingStart: start,
      fittingEnd: start ? new Date(start.getTime() + 3_600_000) : null,
      holdUntil: start ? new Date(row.holdUntil ?? start.getTime() + 86_400_000) : null,
      calendarSequence: row.calendarSequence ?? 0,
    })
    .returning({ id: offer.id });
  await db.insert(offerLine).values({ offerId: made!.id, position: 0, stockItemId: row.stockItemId, quantity: 4, priceCents: 18_299, estimate: FOUR_AT_182_99 });
  return made!.id;
}
