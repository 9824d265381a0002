import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { offer, stockItem } from "@/db/schema";
import { holdOfferTires } from "@/lib/offers/hold-writes";
import { runFittingSchedule } from "@/lib/offers/schedule";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { insertOffer, seedOfferWorld } from "./offer-rows";

describe.each(testDatabaseKinds)("one step of the fittings' schedule on %s", (kind) => {
  let database: TestDatabase;
  let fake: FakeResend;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    vi.spyOn(console, "error").mockImplementation(() => {});
    fake = await startFakeResend({ port: 0 });
    vi.stubEnv("RESEND_BASE_URL", fake.url);
    vi.stubEnv("RESEND_API_KEY", "");
  });
  afterAll(async () => {
    vi.unstubAllEnvs();
    vi.restoreAllMocks();
    await fake.close();
    await database?.close();
  });

  it("gives back the tires of a hold whose day has ended, then reminds tomorrow's driver", async () => {
    const world = await seedOfferWorld(database.db);
    // Yesterday's fitting (December 3, New York), held until the end of that day: 05:00 UTC on December 4.
    const past = await insertOffer(database.db, { ...world, token: "PastTokenAbcdefghijklmno", fittingStart: "2026-12-03T14:00:00Z", holdUntil: "2026-12-04T05:00:00Z" });
    // Tomorrow's fitting (December 5).
    const next = await insertOffer(database.db, { ...world, token: "NextTokenAbcdefghijklmno", fittingStart: "2026-12-05T14:00:00Z", holdUntil: "2026-12-06T05:00:00Z" });
    expect(await holdOfferTires(database.db, past)).toBe(true);
    expect(await holdOfferTires(database.db, next)).toBe(true);

    expect(await runFittingSchedule(database.db, new Date("2026-12-04T15:00:00Z"))).toEqual({ released: 1, reminded: 1 });
    const [item] = await database.db.select({ held: stockItem.heldQuantity }).from(stockItem).where(eq(stockItem.id, world.stockItemId));
    expect(item?.held).toBe(4);
    const [released] = await database.db.select({ at: offer.holdReleasedAt }).from(offer).where(eq(offer.id, past));
    expect(released?.at).toEqual(new Date("2026-12-04T15:00:00Z"));
    expect(fake.received()).toHaveLength(1);
  });
});
