import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { offer, quoteRequest, stockItem } from "@/db/schema";
import { seedDemoData } from "@/lib/demo";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { seedDemoRequestsIfEmpty } from "@/lib/demo/requests";
import { listFittings } from "@/lib/offers/queries";
import { openTestDatabase, type TestDatabase } from "../helpers/test-database";
import { MONDAY_8AM } from "./offer-setup";

describe("the demo shop's requests, offers and fittings", () => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase("pglite");
    vi.spyOn(console, "error").mockImplementation(() => {});
    vi.stubEnv("RESEND_BASE_URL", "http://127.0.0.1:9");
    await seedDemoData(database.db);
    await seedDemoAccounts(database.db);
    await seedDemoRequestsIfEmpty(database.db, MONDAY_8AM);
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    vi.unstubAllEnvs();
    await database?.close();
  });

  it("holds requests in several states, an open offer and two fittings on the first day with free times", async () => {
    const requests = await database.db.select({ status: quoteRequest.status }).from(quoteRequest);
    expect(requests.map((row) => row.status).sort()).toEqual(["answered", "new", "offered", "offered", "offered"]);
    const offers = await database.db.select({ status: offer.status }).from(offer);
    expect(offers.map((row) => row.status).sort()).toEqual(["accepted", "accepted", "open"]);
    // The day after the seed (Tuesday 8 December), from the demo shop's opening at 07:30 New York time, one on each bay.
    const fittings = await listFittings(database.db, new Date("2026-12-08T05:00:00Z"), new Date("2026-12-09T05:00:00Z"), MONDAY_8AM);
    expect(fittings.map((fitting) => [fitting.fitting?.bay, fitting.fitting?.start.toISOString(), fitting.fitting?.held])).toEqual([
      [1, "2026-12-08T12:30:00.000Z", true],
      [2, "2026-12-08T12:30:00.000Z", true],
    ]);
    const held = await database.db.select({ held: stockItem.heldQuantity }).from(stockItem);
    expect(held.reduce((sum, row) => sum + row.held, 0)).toBe(8);
  });

  it("seeds once: a database with requests is left alone", async () => {
    await seedDemoRequestsIfEmpty(database.db, MONDAY_8AM);
    expect(await database.db.$count(quoteRequest)).toBe(5);
  });
});
