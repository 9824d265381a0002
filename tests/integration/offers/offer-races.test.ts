import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { offer } from "@/db/schema";
import { acceptOffer } from "@/lib/offers/accept-offer";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { MONDAY_8AM, offerFor, seedOfferShop, stockOf } from "./offer-setup";

const TUESDAY_930 = "2026-12-08T09:30:00-05:00";
const TUESDAY_1030 = "2026-12-08T10:30:00-05:00";

/** Both accepts are sent before either answers; the database decides. */
const race = (...accepts: [token: string, slot: string][]) => Promise.all(accepts.map(([token, slot]) => acceptOffer(database.db, token, slot, MONDAY_8AM)));
let database: TestDatabase;

describe.each(testDatabaseKinds)("two drivers at once, on %s", (kind) => {
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    vi.spyOn(console, "error").mockImplementation(() => {});
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    vi.unstubAllEnvs();
    await database?.close();
  });

  describe("with two bays", () => {
    beforeEach(async () => {
      await database.reset();
      await seedOfferShop(database.db, { fittingBays: 2 });
    });

    it("for the last set: one holds it, the other is told the tires are gone", async () => {
      const first = await offerFor(database.db, [{ sku: "OF-4", quantity: 4 }]);
      const second = await offerFor(database.db, [{ sku: "OF-4", quantity: 4 }]);
      const answers = await race([first.token, TUESDAY_930], [second.token, TUESDAY_1030]);
      expect(answers.filter((answer) => answer.ok)).toHaveLength(1);
      expect(answers.find((answer) => !answer.ok)).toMatchObject({ code: "not_enough_stock" });
      expect(await stockOf(database.db, "OF-4")).toEqual({ onHand: 4, held: 4, fitmentInStock: 0 });
      const statuses = await database.db.select({ status: offer.status }).from(offer);
      expect(statuses.map((row) => row.status).sort()).toEqual(["accepted", "open"]);
    });

    it("for one slot with a bay left each: both are booked, on different bays", async () => {
      const first = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
      const second = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
      const answers = await race([first.token, TUESDAY_930], [second.token, TUESDAY_930]);
      expect(answers.every((answer) => answer.ok)).toBe(true);
      const bays = await database.db.select({ bay: offer.fittingBay }).from(offer);
      expect(bays.map((row) => row.bay).sort()).toEqual([1, 2]);
      expect(await stockOf(database.db, "OF-9")).toMatchObject({ onHand: 9, held: 8 });
    });

    it("the same offer accepted twice at once: booked once", async () => {
      const sent = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
      const answers = await race([sent.token, TUESDAY_930], [sent.token, TUESDAY_1030]);
      expect(answers.filter((answer) => answer.ok)).toHaveLength(1);
      expect(answers.find((answer) => !answer.ok)).toMatchObject({ code: "already_accepted" });
      expect(await stockOf(database.db, "OF-9")).toMatchObject({ held: 4 });
    });
  });

  describe("with one bay", () => {
    beforeEach(async () => {
      await database.reset();
      await seedOfferShop(database.db, { fittingBays: 1 });
    });

    it("for the last slot: one is booked, the other is told the time is taken and given the next free ones", async () => {
      const first = await offerFor(database.db, [{ sku: "OF-9", quantity: 4 }]);
      const second = await offerFor(database.db, [{ sku: "OF-4", quantity: 4 }]);
      const answers = await race([first.token, TUESDAY_930], [second.token, TUESDAY_930]);
      expect(answers.filter((answer) => answer.ok)).toHaveLength(1);
      const loser = answers.find((answer) => !answer.ok);
      expect(loser).toMatchObject({ code: "slot_taken" });
      expect(loser && !loser.ok && loser.nextSlots?.some((slot) => slot.start === TUESDAY_930)).toBe(false);
      // The loser holds nothing: its transaction rolled back whole.
      const [lost] = await database.db.select({ status: offer.status, bay: offer.fittingBay }).from(offer).where(eq(offer.token, answers[0]!.ok ? second.token : first.token));
      expect(lost).toEqual({ status: "open", bay: null });
      expect((await stockOf(database.db, "OF-4")).held + (await stockOf(database.db, "OF-9")).held).toBe(4);
    });
  });
});
