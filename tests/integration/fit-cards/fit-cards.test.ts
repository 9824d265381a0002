import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { fitCard, shop, stockItem, user } from "@/db/schema";
import { demoShop, demoShopCharges } from "@/lib/demo/shop";
import { estimateSet } from "@/lib/money/estimate";
import { newFitCardSchema } from "@/lib/fit-cards/card-input";
import { search } from "../catalog/fixtures";
import { createFitCard } from "@/lib/fit-cards/create-card";
import { readFitCard } from "@/lib/fit-cards/read-card";
import { listAllCards, listOwnCards } from "@/lib/fit-cards/queries";
import { revokeFitCard } from "@/lib/fit-cards/revoke-card";
import { FIT_CARD_SLUG_PATTERN } from "@/lib/fit-cards/card-input";
import { seedFixture } from "../catalog/fixtures";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const author = { id: "u-author", name: "Dana", email: "dana@example.test", role: "customer" };
const stranger = { id: "u-other", name: "Lee", email: "lee@example.test", role: "customer" };
const staff = { id: "u-staff", name: "Ollie", email: "ollie@example.test", role: "staff" };

const cardInput = (overrides: Record<string, unknown> = {}) =>
  newFitCardSchema.parse({ sizes: ["225/45R17", "225/40R18"], skus: ["FC-17", "FC-18"], loadIndex: 91, speedSymbol: "v", note: "For the blue hatchback", ...overrides });

describe.each(testDatabaseKinds)("Fit cards on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    await database.db.insert(user).values([author, stranger, staff]);
    await seedFixture(database.db, [
      { sku: "FC-17", designation: "225/45R17", loadIndex: 94, speedSymbol: "W", extraLoad: true, priceCents: 15_900 },
      { sku: "FC-18", designation: "225/40R18", loadIndex: 92, speedSymbol: "Y", priceCents: 17_900 },
      { sku: "FC-OLD", designation: "225/45R17", loadIndex: 91, speedSymbol: "V", retired: true },
      { sku: "FC-DUAL", designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, loadRange: "E", speedSymbol: "S" },
      { sku: "FC-SINGLE", designation: "LT265/75R16", loadIndex: 126, loadRange: "E", speedSymbol: "S" },
    ]);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("saves a card under a random 144-bit slug and shows it with prices then and now", async () => {
    const saved = await createFitCard(database.db, author.id, cardInput());
    if (!saved.ok) throw new Error(saved.message);
    expect(saved.slug).toMatch(FIT_CARD_SLUG_PATTERN);
    await database.db.update(stockItem).set({ priceCents: 14_900 }).where(eq(stockItem.sku, "FC-17"));

    const lookup = await readFitCard(database.db, saved.slug);
    if (lookup.status !== "found") throw new Error(lookup.status);
    const { card } = lookup;
    expect(card.sizes).toEqual(["225/45R17", "225/40R18"]);
    expect(card.original).toMatchObject({ designation: "225/45R17", loadIndex: 91, speedSymbol: "V", loadRange: null });
    expect(card.tolerancePct).toBe(3);
    expect(card.tires.map((tire) => [tire.sku, tire.priceCentsAtSave, tire.priceCents, tire.equalOrBetter])).toEqual([
      ["FC-17", 15_900, 14_900, true],
      ["FC-18", 17_900, 17_900, false],
    ]);
    expect(card.tires[0]?.reasons).toContain("same 17-inch rim");
    expect(card.tires[1]?.reasons[0]).toBe("18-inch rim, not 17-inch: a plus size needs other wheels");
  });

  it("keeps everything the judge reads about the original, and judges each tire exactly as the finder does", async () => {
    const truck = {
      size: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "S", loadRange: "E" as const,
      minLoadIndex: 121, minLoadIndexDual: 120, season: "winter" as const,
    };
    const saved = await createFitCard(
      database.db,
      staff.id,
      cardInput({ sizes: [truck.size], skus: ["FC-DUAL", "FC-SINGLE"], note: "For the work truck", loadIndex: 123, loadIndexDual: 120, speedSymbol: "S", loadRange: "E", runFlat: false, minLoadIndex: 121, minLoadIndexDual: 120, originalSeason: "winter" }),
    );
    if (!saved.ok) throw new Error(saved.message);
    const lookup = await readFitCard(database.db, saved.slug);
    if (lookup.status !== "found") throw new Error(lookup.status);
    expect(lookup.card.original).toMatchObject({ loadIndexDual: 120, runFlat: false, minLoadIndex: 121, minLoadIndexDual: 120, season: "winter", loadRange: "E" });
    const [dual, single] = lookup.card.tires;
    // Rule 3: a tire without a dual index never qualifies for a dual original (common practice).
    expect([dual?.equalOrBetter, single?.equalOrBetter]).toEqual([true, false]);
    expect(single?.reasons).toEqual(["no dual load index: not rated for dual wheels (needs a dual index of 120 or more)"]);
    expect(dual?.notes).toEqual(["season change: an all-season tire in place of the winter tire on the car now"]);

    const finder = await search(database.db, truck, { tolerancePct: lookup.card.tolerancePct });
    const found = finder.results.find((tire) => tire.sku === "FC-DUAL");
    expect(dual?.reasons).toEqual(found?.reasons);
    expect(dual?.notes).toEqual(found?.notes);
    expect(single?.reasons).toEqual(finder.nearMisses.find((tire) => tire.sku === "FC-SINGLE")?.failed);
  });

  it("shows each tire's quantity as it is now and what a set of four costs at today's price", async () => {
    await database.db.insert(shop).values(demoShop);
    const saved = await createFitCard(database.db, author.id, cardInput());
    if (!saved.ok) throw new Error(saved.message);
    const read = async () => {
      const lookup = await readFitCard(database.db, saved.slug);
      if (lookup.status !== "found") throw new Error(lookup.status);
      return lookup.card;
    };
    const card = await read();
    expect(card.quantity).toBe(4);
    expect(card.tires.map((tire) => [tire.sku, tire.quantity, tire.inStock])).toEqual([
      ["FC-17", 4, true],
      ["FC-18", 4, true],
    ]);
    for (const tire of card.tires) expect(tire.estimate).toEqual(estimateSet(tire.priceCents, 4, demoShopCharges));

    // Read live, never frozen with the card: a sale, a price change, a retirement.
    await database.db.update(stockItem).set({ quantityOnHand: 1, priceCents: 18_299 }).where(eq(stockItem.sku, "FC-18"));
    const later = await read();
    expect(later.tires[1]).toMatchObject({ quantity: 1, inStock: true, priceCents: 18_299, priceCentsAtSave: 17_900 });
    // 4 × $182.99 with the demo shop's charges: 73,196 + 10,000 + 2,000 + 6,148 tax (tests/unit/money/estimate.test.ts).
    expect(later.tires[1]?.estimate).toEqual({ quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 6_148, totalCents: 91_344 });
    await database.db.update(stockItem).set({ retired: true }).where(eq(stockItem.sku, "FC-18"));
    expect((await read()).tires[1]).toMatchObject({ quantity: 0, inStock: false, stillStocked: false });
    await database.db.update(stockItem).set({ retired: false, quantityOnHand: 4, priceCents: 17_900 }).where(eq(stockItem.sku, "FC-18"));
    await database.db.delete(shop);
  });

  it("keeps internal fields out of the public card", async () => {
    const saved = await createFitCard(database.db, author.id, cardInput());
    if (!saved.ok) throw new Error(saved.message);
    const lookup = await readFitCard(database.db, saved.slug);
    const text = JSON.stringify(lookup);
    for (const internal of ["authorId", "author", "u-author", "dana@example.test", "quantityOnHand", "stockItemId", "revokedAt", '"id"']) {
      expect(text).not.toContain(internal);
    }
  });

  it("keeps the depths of the tires that stay on an all-wheel-drive vehicle and judges each tire beside them", async () => {
    await database.db.update(stockItem).set({ treadDepth32: 10 }).where(eq(stockItem.sku, "FC-17"));
    const saved = await createFitCard(database.db, author.id, cardInput({ wear: { remaining32: [7, 7.5, 8], limit32: 2 } }));
    if (!saved.ok) throw new Error(saved.message);
    const lookup = await readFitCard(database.db, saved.slug);
    if (lookup.status !== "found") throw new Error(lookup.status);
    expect(lookup.card.wear).toEqual({ remaining32: [7, 7.5, 8], limit32: 2 });
    // 10/32 new beside 7 to 8/32 with a 2/32 limit: shave to 7 + 2 = 9/32 (worked by hand).
    expect(lookup.card.tires.map((tire) => [tire.sku, tire.wear?.verdict, tire.wear?.shaveTo32])).toEqual([
      ["FC-17", "shave", 9],
      ["FC-18", "otherSize", null],
    ]);
    const plain = await createFitCard(database.db, author.id, cardInput());
    const plainLookup = plain.ok ? await readFitCard(database.db, plain.slug) : null;
    expect(plainLookup?.status === "found" && plainLookup.card.wear).toBeNull();
  });

  it("refuses depths that are not whole or halves, and a limit saved without the depths it belongs to", async () => {
    expect(newFitCardSchema.safeParse({ ...cardInput(), wear: { remaining32: [7.25, 8], limit32: 2 } }).success).toBe(false);
    expect(newFitCardSchema.safeParse({ ...cardInput(), wear: { remaining32: [7], limit32: 2 } }).success).toBe(false);
    expect(newFitCardSchema.safeParse({ ...cardInput(), wear: { remaining32: [7, 8], limit32: 9 } }).success).toBe(false);
    const [one] = await database.db.select().from(fitCard).limit(1);
    await expect(database.db.update(fitCard).set({ wearLimit32: 2, wearRemaining32: null }).where(eq(fitCard.id, one!.id))).rejects.toThrow();
  });

  it("gives every card its own slug", async () => {
    const slugs = new Set<string>();
    for (let i = 0; i < 40; i++) {
      const saved = await createFitCard(database.db, author.id, cardInput({ skus: [] }));
      if (saved.ok) slugs.add(saved.slug);
    }
    expect(slugs.size).toBe(40);
  });

  it("refuses a retired or unknown SKU and an unreadable size, saving nothing", async () => {
    const before = (await database.db.select({ id: fitCard.id }).from(fitCard)).length;
    expect(await createFitCard(database.db, author.id, cardInput({ skus: ["FC-OLD"] }))).toMatchObject({ ok: false, code: "invalid_parameter" });
    expect(await createFitCard(database.db, author.id, cardInput({ sizes: ["banana"] }))).toMatchObject({ ok: false, code: "unreadable" });
    expect(await createFitCard(database.db, author.id, cardInput({ speedSymbol: "X" }))).toMatchObject({ ok: false, code: "unknown_speed_symbol" });
    expect((await database.db.select({ id: fitCard.id }).from(fitCard)).length).toBe(before);
  });

  it("is withdrawn by its author or staff, not by someone else, and expires", async () => {
    const saved = await createFitCard(database.db, author.id, cardInput());
    if (!saved.ok) throw new Error(saved.message);
    expect(await revokeFitCard(database.db, stranger, saved.slug)).toBe("forbidden");
    expect(await revokeFitCard(database.db, staff, saved.slug)).toBe("revoked");
    expect(await readFitCard(database.db, saved.slug)).toEqual({ status: "withdrawn", why: "revoked" });
    expect(await revokeFitCard(database.db, author, "A".repeat(24))).toBe("not_found");

    const brief = await createFitCard(database.db, author.id, cardInput({ expiresInDays: 1 }));
    if (!brief.ok) throw new Error(brief.message);
    expect((await readFitCard(database.db, brief.slug)).status).toBe("found");
    expect(await readFitCard(database.db, brief.slug, new Date(Date.now() + 2 * 86_400_000))).toEqual({ status: "withdrawn", why: "expired" });
  });

  it("lists a person's own cards and every card for the Counter, with their state and search", async () => {
    const own = await listOwnCards(database.db, author.id);
    expect(own.length).toBeGreaterThan(40);
    expect(own.every((card) => !("authorId" in card))).toBe(true);
    expect(new Set(own.map((card) => card.state))).toEqual(new Set(["active", "withdrawn"]));
    expect(await listOwnCards(database.db, stranger.id)).toEqual([]);

    const found = await listAllCards(database.db, { q: "blue hatch", page: 1 });
    expect(found.total).toBeGreaterThan(0);
    expect(found.cards.every((card) => card.authorEmail === author.email && card.note === "For the blue hatchback")).toBe(true);
    expect((await listAllCards(database.db, { q: "225/40R18", page: 1 })).total).toBeGreaterThan(0);
    expect((await listAllCards(database.db, { q: "nothing like this", page: 1 })).total).toBe(0);
  });
});
