import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { offer, quoteRequest, stockItem } from "@/db/schema";
import { demoShopCharges } from "@/lib/demo/shop";
import { estimatePackage } from "@/lib/money/estimate";
import { acceptOffer } from "@/lib/offers/accept-offer";
import { cancelByDriver } from "@/lib/offers/cancel-offer";
import { releaseExpiredHolds } from "@/lib/offers/hold-writes";
import { readOfferSlots } from "@/lib/offers/offer-slots";
import { readPublicOffer } from "@/lib/offers/public-offer";
import { markFitting, withdrawOffer } from "@/lib/offers/staff-offers";
import { updateStockItem } from "@/lib/stock/item-writes";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { MONDAY_8AM, offerFor, seedOfferShop, staff, stockOf } from "./offer-setup";

/** A free start: the demo shop opens at 07:30, and fittings start on the hour and a half after it. */
const TUESDAY_930 = "2026-12-08T09:30:00-05:00";

describe.each(testDatabaseKinds)("priced offers, holds and fittings, on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    vi.spyOn(console, "error").mockImplementation(() => {});
  });
  beforeEach(async () => {
    await database.reset();
    await seedOfferShop(database.db);
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    vi.unstubAllEnvs();
    await database?.close();
  });

  it("freezes the package's estimate when sent and marks the request offered", async () => {
    const sent = await offerFor(database.db, [{ sku: "OF-4", quantity: 2 }, { sku: "OF-9", quantity: 2 }]);
    await database.db.update(stockItem).set({ priceCents: 99_999 }).where(eq(stockItem.sku, "OF-4"));
    const read = await readPublicOffer(database.db, sent.token, MONDAY_8AM);
    const expected = estimatePackage([{ priceCents: 18_299, quantity: 2 }, { priceCents: 12_000, quantity: 2 }], demoShopCharges);
    expect(read?.estimate).toEqual(expected);
    expect(read?.lines.map((line) => [line.tire.sku, line.quantity, line.priceCents])).toEqual([["OF-4", 2, 18_299], ["OF-9", 2, 12_000]]);
    // Seven days on, to the end of that day in New York (EST, UTC−5).
    expect([read?.status, read?.validUntilDate, read?.validUntil]).toEqual(["open", "2026-12-14", "2026-12-15T00:00:00-05:00"]);
    const [request] = await database.db.select({ status: quoteRequest.status }).from(quoteRequest).where(eq(quoteRequest.id, sent.requestId));
    expect(request?.status).toBe("offered");
  });

  it("measures each line against the driver's original by the rules of equal-or-better", async () => {
    const sent = await offerFor(database.db, [{ sku: "OF-4", quantity: 4 }]);
    const read = await readPublicOffer(database.db, sent.token, MONDAY_8AM);
    expect(read?.original).toBe("205/55R16 91H");
    expect(read?.lines[0]?.verdict?.equalOrBetter).toBe(true);
  });

  it("holds the tires when accepted, so what can be sold drops, and refuses a second accept", async () => {
    const sent = await offerFor(database.db, [{ sku: "OF-4", quantity: 4 }]);
    const accepted = await acceptOffer(database.db, sent.token, TUESDAY_930, MONDAY_8AM);
    expect(accepted).toMatchObject({ ok: true, appointment: { start: TUESDAY_930, end: "2026-12-08T10:30:00-05:00" } });
    expect(await stockOf(database.db, "OF-4")).toEqual({ onHand: 4, held: 4, fitmentInStock: 0 });
    const read = await readPublicOffer(database.db, sent.token, MONDAY_8AM);
    expect([read?.status, read?.lines[0]?.tire.quantity, read?.cancelUntil]).toEqual(["accepted", 0, "2026-12-07T09:30:00-05:00"]);
    expect(await acceptOffer(database.db, sent.token, "2026-12-08T10:30:00-05:00", MONDAY_8AM)).toMatchObject({ ok: false, code: "already_accepted" });
  });

  it("takes the same instant written in another offset, and refuses a time that is no free start with the next free ones", async () => {
    const sent = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
    const refused = await acceptOffer(database.db, sent.token, "2026-12-08T09:10:00-05:00", MONDAY_8AM);
    expect(refused).toMatchObject({ ok: false, code: "slot_taken" });
    expect(refused.ok ? [] : refused.nextSlots?.[0]).toEqual({ start: "2026-12-07T10:30:00-05:00", end: "2026-12-07T11:30:00-05:00" });
    expect(await acceptOffer(database.db, sent.token, "2026-12-08T14:30:00Z", MONDAY_8AM)).toMatchObject({ ok: true, appointment: { start: TUESDAY_930 } });
  });

  it("answers gone for an expired, withdrawn or cancelled offer", async () => {
    const expiring = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }], MONDAY_8AM, { validUntil: "2026-12-07" });
    expect(await acceptOffer(database.db, expiring.token, TUESDAY_930, new Date("2026-12-08T05:00:00Z"))).toMatchObject({ ok: false, reason: "expired", code: "gone" });
    const withdrawn = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
    expect(await withdrawOffer(database.db, staff, withdrawn.id, MONDAY_8AM)).toEqual({ ok: true });
    expect(await acceptOffer(database.db, withdrawn.token, TUESDAY_930, MONDAY_8AM)).toMatchObject({ ok: false, reason: "withdrawn", code: "gone" });
    expect(await readOfferSlots(database.db, "N".repeat(32), { now: MONDAY_8AM })).toBeNull();
  });

  it("lets the driver cancel before the cut-off, which frees the bay and the tires, and not after", async () => {
    const sent = await offerFor(database.db, [{ sku: "OF-4", quantity: 4 }]);
    await acceptOffer(database.db, sent.token, "2026-12-09T09:30:00-05:00", MONDAY_8AM);
    expect(await cancelByDriver(database.db, sent.token, new Date("2026-12-08T14:30:00Z"))).toMatchObject({ ok: false, code: "too_late" });
    expect(await cancelByDriver(database.db, sent.token, MONDAY_8AM)).toMatchObject({ ok: true });
    expect(await stockOf(database.db, "OF-4")).toEqual({ onHand: 4, held: 0, fitmentInStock: 1 });
    const [row] = await database.db.select({ sequence: offer.calendarSequence, status: offer.status }).from(offer).where(eq(offer.id, sent.id));
    expect(row).toEqual({ sequence: 1, status: "cancelled" });
    expect(await cancelByDriver(database.db, sent.token, MONDAY_8AM)).toMatchObject({ ok: false, code: "gone" });
  });

  it("sells the held tires when staff mark the fitting done, and gives them back for a no-show", async () => {
    const fitted = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
    const missed = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
    await acceptOffer(database.db, fitted.token, TUESDAY_930, MONDAY_8AM);
    await acceptOffer(database.db, missed.token, TUESDAY_930, MONDAY_8AM);
    expect(await stockOf(database.db, "OF-9")).toMatchObject({ onHand: 9, held: 8 });
    expect(await markFitting(database.db, staff, fitted.id, "fitted")).toEqual({ ok: true });
    expect(await markFitting(database.db, staff, missed.id, "no-show")).toEqual({ ok: true });
    expect(await stockOf(database.db, "OF-9")).toEqual({ onHand: 5, held: 0, fitmentInStock: 1 });
    expect(await markFitting(database.db, staff, fitted.id, "fitted")).toMatchObject({ ok: false, status: 409 });
  });

  it("releases a hold once its fitting's day has ended in the shop's zone, not before", async () => {
    const sent = await offerFor(database.db, [{ sku: "OF-4", quantity: 4 }]);
    await acceptOffer(database.db, sent.token, TUESDAY_930, MONDAY_8AM);
    expect(await releaseExpiredHolds(database.db, new Date("2026-12-09T04:59:59Z"))).toBe(0);
    expect(await releaseExpiredHolds(database.db, new Date("2026-12-09T05:00:00Z"))).toBe(1);
    expect(await stockOf(database.db, "OF-4")).toMatchObject({ onHand: 4, held: 0 });
    // Marked done later, the tires still leave the shelf.
    expect(await markFitting(database.db, staff, sent.id, "fitted")).toEqual({ ok: true });
    expect(await stockOf(database.db, "OF-4")).toMatchObject({ onHand: 0, held: 0 });
  });

  it("refuses to lower the quantity on hand below what is held, naming the offer that holds it", async () => {
    const sent = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
    await acceptOffer(database.db, sent.token, TUESDAY_930, MONDAY_8AM);
    const refused = await updateStockItem(database.db, "OF-9", { quantity: 3 }, staff);
    expect(refused).toMatchObject({ ok: false, code: "held_for_fittings", field: "quantity" });
    expect(refused.ok ? "" : refused.message).toContain(`offer ${sent.id}`);
    expect(await updateStockItem(database.db, "OF-9", { quantity: 4 }, staff)).toMatchObject({ ok: true, tire: { quantity: 0 } });
  });
});
