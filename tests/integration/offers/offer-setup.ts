import { eq } from "drizzle-orm";
import { vi } from "vitest";
import type { Database } from "@/db/client";
import { quoteRequest, shop, stockFitment, stockItem, user } from "@/db/schema";
import type { Actor } from "@/lib/audit/record";
import { demoShop } from "@/lib/demo/shop";
import { createOffer } from "@/lib/offers/create-offer";
import { newOfferSchema } from "@/lib/offers/offer-input";
import { seedFixture } from "../catalog/fixtures";

export const staff: Actor = { id: "staff-test", email: "staff@sidewise.test" };

/** Monday 7 December 2026, 08:00 in New York (EST, UTC−5): the demo shop opens 07:30–18:00 on weekdays. */
export const MONDAY_8AM = new Date("2026-12-07T13:00:00Z");

/** The demo shop, one bay or more, fittings an hour apart, booked at least two hours ahead, cancelled online up to a day before. */
export async function seedOfferShop(db: Database, { fittingBays = 2 } = {}): Promise<void> {
  vi.stubEnv("RESEND_BASE_URL", "http://127.0.0.1:9");
  await db.insert(user).values({ id: staff.id, name: "Counter Staff", email: staff.email, role: "staff" });
  await db.insert(shop).values({ ...demoShop, timeZone: "America/New_York", fittingBays, fittingMinutes: 60, leadMinutes: 120, cancelCutoffHours: 24 });
  await seedFixture(db, [
    { sku: "OF-4", designation: "205/55R16", loadIndex: 94, speedSymbol: "V", priceCents: 18_299, quantity: 4 },
    { sku: "OF-9", designation: "205/55R16", loadIndex: 91, speedSymbol: "H", priceCents: 12_000, quantity: 9 },
  ]);
}

export async function newRequest(db: Database, tires = "Replacing 205/55R16 91H"): Promise<number> {
  const [row] = await db
    .insert(quoteRequest)
    .values({ name: "Rosa Iverley", email: "rosa@example.test", vehicle: "2019 family hatchback", tires, quantity: 4, source: "finder" })
    .returning({ id: quoteRequest.id });
  return row!.id;
}

/** A new request and an open offer on it: its token. */
export async function offerFor(db: Database, lines: { sku: string; quantity: number }[], now = MONDAY_8AM, extra: { validUntil?: string } = {}): Promise<{ id: number; token: string; requestId: number }> {
  const requestId = await newRequest(db);
  const created = await createOffer(db, staff, requestId, newOfferSchema.parse({ lines, ...extra }), now);
  if (!created.ok) throw new Error(created.message);
  return { id: created.offer.id, token: created.offer.token, requestId };
}

/** On hand, held, and the fitment's count of items with one to sell. */
export async function stockOf(db: Database, sku: string) {
  const [row] = await db
    .select({ onHand: stockItem.quantityOnHand, held: stockItem.heldQuantity, fitmentInStock: stockFitment.inStockCount })
    .from(stockItem)
    .innerJoin(stockFitment, eq(stockItem.fitmentId, stockFitment.id))
    .where(eq(stockItem.sku, sku));
  return row!;
}
