import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { emailSend, offer, quoteRequest, quoteRequestTire, stockItem } from "@/db/schema";
import { demoShopCharges } from "@/lib/demo/shop";
import { estimatePackage } from "@/lib/money/estimate";
import { acceptOffer } from "@/lib/offers/accept-offer";
import { findOfferTire, markFitting, sendOffer, withdrawOffer } from "@/lib/offers/actions";
import { listRequestOffers } from "@/lib/offers/queries";
import { recordWalkIn } from "@/lib/quotes/actions";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { MONDAY_8AM, newRequest, seedOfferShop, stockOf } from "./offer-setup";

// The actions read the caller from the session and the database from the app: here, a staff member
// on the app's own origin, and the database under test.
const app = vi.hoisted(() => ({ db: undefined as unknown }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ origin: "http://localhost:3000" }) }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => ({ id: "staff-test", name: "Counter Staff", email: "staff@sidewise.test", role: "staff" }) }));
vi.mock("@/lib/database/app-database", () => ({ getDb: async () => app.db }));

const TUESDAY_930 = "2026-12-08T09:30:00-05:00";

describe.each(testDatabaseKinds)("the Counter's offer actions, on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    app.db = database.db;
    // Every "now" of the actions is Monday 8 AM in the shop's zone; no timer is faked.
    vi.useFakeTimers({ toFake: ["Date"], now: MONDAY_8AM });
  });
  beforeEach(async () => {
    await database.reset();
    await seedOfferShop(database.db);
  });
  afterAll(async () => {
    vi.useRealTimers();
    vi.unstubAllEnvs();
    await database?.close();
  });

  async function sent(requestId: number, lines: { sku: string; quantity: number }[]) {
    const result = await sendOffer({ requestId, lines, message: "Fresh stock this week." });
    if (!result.ok) throw new Error(result.message);
    const [row] = await database.db.select({ token: offer.token }).from(offer).where(eq(offer.id, result.data.id));
    return { ...result.data, token: row!.token };
  }

  it("sends an offer whose estimate stays as sent when the price changes, and marks the request offered", async () => {
    const requestId = await newRequest(database.db);
    const offerSent = await sent(requestId, [{ sku: "OF-4", quantity: 2 }, { sku: "OF-9", quantity: 2 }]);
    expect(offerSent.url).toMatch(/^https?:\/\/[^/]+\/o\/[A-Za-z0-9_-]{32}$/);
    await database.db.update(stockItem).set({ priceCents: 99_999 }).where(eq(stockItem.sku, "OF-4"));
    const [listed] = await listRequestOffers(database.db, requestId);
    expect(listed?.estimate).toEqual(estimatePackage([{ priceCents: 18_299, quantity: 2 }, { priceCents: 12_000, quantity: 2 }], demoShopCharges));
    expect([listed?.status, listed?.validUntilDate, listed?.message]).toEqual(["open", "2026-12-14", "Fresh stock this week."]);
    const [request] = await database.db.select({ status: quoteRequest.status }).from(quoteRequest).where(eq(quoteRequest.id, requestId));
    expect(request?.status).toBe("offered");
  });

  it("refuses an unknown SKU, a past day or no tires with a message per field, and saves nothing", async () => {
    const requestId = await newRequest(database.db);
    expect(await sendOffer({ requestId, lines: [{ sku: "NOPE-1", quantity: 4 }] })).toMatchObject({ ok: false, status: 400, fieldErrors: { lines: expect.stringContaining("NOPE-1") } });
    expect(await sendOffer({ requestId, lines: [{ sku: "OF-4", quantity: 4 }], validUntil: "2026-12-06" })).toMatchObject({ ok: false, status: 400, fieldErrors: { validUntil: expect.stringContaining("has passed") } });
    expect(await sendOffer({ requestId, lines: [] })).toMatchObject({ ok: false, status: 400, fieldErrors: { lines: expect.stringContaining("at least one tire") } });
    expect(await sendOffer({ requestId, lines: [{ sku: "OF-4", quantity: 9 }] })).toMatchObject({ ok: false, status: 400 });
    expect(await sendOffer({ requestId: 999_999, lines: [{ sku: "OF-4", quantity: 4 }] })).toMatchObject({ ok: false, status: 404 });
    expect(await database.db.select().from(offer)).toEqual([]);
  });

  it("withdraws an open offer once, and then refuses to", async () => {
    const requestId = await newRequest(database.db);
    const { id } = await sent(requestId, [{ sku: "OF-9", quantity: 4 }]);
    expect(await withdrawOffer({ id, requestId })).toMatchObject({ ok: true });
    expect((await listRequestOffers(database.db, requestId))[0]?.status).toBe("withdrawn");
    expect(await withdrawOffer({ id, requestId })).toMatchObject({ ok: false, status: 409 });
  });

  it("marks a booked fitting fitted, taking the held tires off the shelf, and refuses an offer with no fitting", async () => {
    const requestId = await newRequest(database.db);
    const { id, token } = await sent(requestId, [{ sku: "OF-4", quantity: 4 }]);
    expect(await markFitting({ id, requestId, outcome: "fitted" })).toMatchObject({ ok: false, status: 409 });
    await acceptOffer(database.db, token, TUESDAY_930, MONDAY_8AM);
    expect(await stockOf(database.db, "OF-4")).toMatchObject({ onHand: 4, held: 4 });
    expect(await markFitting({ id, requestId, outcome: "fitted" })).toMatchObject({ ok: true });
    expect(await stockOf(database.db, "OF-4")).toMatchObject({ onHand: 0, held: 0 });
    expect(await markFitting({ id, requestId, outcome: "fitted" })).toMatchObject({ ok: false, status: 409 });
    expect(await markFitting({ id, requestId, outcome: "sold" })).toMatchObject({ ok: false, status: 400, fieldErrors: { outcome: "choose fitted, no-show or cancelled" } });
  });

  it("puts the held tires back on sale for a no-show", async () => {
    const requestId = await newRequest(database.db);
    const { id, token } = await sent(requestId, [{ sku: "OF-9", quantity: 4 }]);
    await acceptOffer(database.db, token, TUESDAY_930, MONDAY_8AM);
    expect(await stockOf(database.db, "OF-9")).toMatchObject({ onHand: 9, held: 4 });
    expect(await markFitting({ id, requestId, outcome: "no-show" })).toMatchObject({ ok: true });
    expect(await stockOf(database.db, "OF-9")).toMatchObject({ onHand: 9, held: 0 });
    expect((await listRequestOffers(database.db, requestId))[0]?.status).toBe("no-show");
  });

  it("finds a catalog tire by SKU with today's price and how many can be sold, and says when there is none", async () => {
    expect(await findOfferTire({ sku: "OF-9" })).toMatchObject({ ok: true, data: { sku: "OF-9", priceCents: 12_000, sellable: 9, label: expect.stringContaining("205/55R16 91H") } });
    expect(await findOfferTire({ sku: "NOPE-1" })).toMatchObject({ ok: false, status: 404 });
  });

  it("records a walk-in customer as a request from the counter with the picked tires, e-mailing no one", async () => {
    const recorded = await recordWalkIn({ name: "Tamsin Orrow", email: "tamsin@example.test", phone: "", vehicle: "2016 estate car", tires: "Replacing 205/55R16 91H", quantity: "4", skus: ["OF-9", "GONE-1"] });
    if (!recorded.ok) throw new Error(recorded.message);
    const [request] = await database.db.select().from(quoteRequest).where(eq(quoteRequest.id, recorded.data.id));
    expect(request).toMatchObject({ source: "counter", status: "new", name: "Tamsin Orrow", phone: null, quantity: 4 });
    expect(await database.db.select({ position: quoteRequestTire.position }).from(quoteRequestTire).where(eq(quoteRequestTire.requestId, recorded.data.id))).toEqual([{ position: 0 }]);
    expect(await database.db.select().from(emailSend)).toEqual([]);
    expect(await recordWalkIn({ name: "", email: "not an address", vehicle: "Van", tires: "205/55R16" })).toMatchObject({ ok: false, status: 400, fieldErrors: { name: expect.any(String), email: expect.any(String) } });
  });
});
