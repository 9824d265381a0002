import { eq } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { emailSend, offer, shop } from "@/db/schema";
import { sendDueReminders } from "@/lib/offers/reminders";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { insertOffer, seedOfferWorld } from "./offer-rows";

// The demo shop is in America/New_York: on 2026-12-04 and 12-05 that is -05:00 (EST), so local
// midnight starting December 5 is 05:00 UTC. The fitting is at 09:00 EST on December 5 (14:00 UTC).
const FITTING = "2026-12-05T14:00:00Z";

describe.each(testDatabaseKinds)("the day-before fitting reminders on %s", (kind) => {
  let database: TestDatabase;
  let fake: FakeResend;
  let world: { requestId: number; stockItemId: number };
  let tokens = 0;
  const booked = (fittingStart: string, status: "accepted" | "cancelled" = "accepted") =>
    insertOffer(database.db, { ...world, token: `ReminderToken${String(++tokens).padStart(12, "0")}`, fittingStart, status });
  const reminderSentAt = async (offerId: number) => (await database.db.select({ at: offer.reminderSentAt }).from(offer).where(eq(offer.id, offerId)))[0]?.at;

  beforeAll(async () => {
    database = await openTestDatabase(kind);
    vi.spyOn(console, "error").mockImplementation(() => {});
  });
  beforeEach(async () => {
    await database.reset();
    world = await seedOfferWorld(database.db);
    fake = await startFakeResend({ port: 0 });
    vi.stubEnv("RESEND_BASE_URL", fake.url);
    vi.stubEnv("RESEND_API_KEY", "");
    vi.stubEnv("EMAIL_FROM", "");
    vi.stubEnv("SITE_URL", "https://sidewise.example.test");
  });
  afterEach(async () => {
    vi.unstubAllEnvs();
    await fake.close();
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    await database?.close();
  });

  it("reminds the driver once on the local day before the fitting, and never twice", async () => {
    const offerId = await booked(FITTING);
    const now = new Date("2026-12-04T15:00:00Z"); // 10:00 EST on December 4
    expect(await sendDueReminders(database.db, now)).toBe(1);
    expect(await sendDueReminders(database.db, new Date("2026-12-04T20:00:00Z"))).toBe(0);

    expect(await reminderSentAt(offerId)).toEqual(now);
    const received = fake.received();
    expect(received).toHaveLength(1);
    expect(received[0]).toMatchObject({ to: "rosa@example.test", subject: expect.stringContaining("tomorrow") });
    const [row] = await database.db.select().from(emailSend);
    expect(row).toMatchObject({ kind: "fitting_reminder", idempotencyKey: `fitting-reminder-${offerId}-0`, status: "sent" });
  });

  it("sends nothing two days before, on the fitting's own day, or for a fitting no longer booked", async () => {
    await booked(FITTING);
    await booked(FITTING, "cancelled");
    expect(await sendDueReminders(database.db, new Date("2026-12-03T15:00:00Z"))).toBe(0); // December 3, local
    expect(await sendDueReminders(database.db, new Date("2026-12-05T12:00:00Z"))).toBe(0); // December 5, 07:00 EST
    expect(fake.received()).toHaveLength(0);
  });

  it("reads the day in the shop's zone, not in UTC", async () => {
    await booked(FITTING);
    // 00:30 UTC on December 5 is still 19:30 EST on December 4: the day before, so it is due.
    expect(await sendDueReminders(database.db, new Date("2026-12-05T00:30:00Z"))).toBe(1);

    await database.reset();
    world = await seedOfferWorld(database.db);
    await booked(FITTING);
    // 05:00 UTC on December 5 is local midnight: the fitting's own day has begun, so it is not.
    expect(await sendDueReminders(database.db, new Date("2026-12-05T05:00:00Z"))).toBe(0);
    // 04:59 UTC is 23:59 EST on December 4: due.
    expect(await sendDueReminders(database.db, new Date("2026-12-05T04:59:00Z"))).toBe(1);
  });

  it("follows the shop's zone when it is east of UTC", async () => {
    await database.db.update(shop).set({ timeZone: "Pacific/Auckland" });
    // 09:00 on 2026-12-05 in Auckland (+13:00, daylight time) is 20:00 UTC on December 4.
    await booked("2026-12-04T20:00:00Z");
    // 12:00 UTC on December 3 is 01:00 on December 4 in Auckland: the day before.
    expect(await sendDueReminders(database.db, new Date("2026-12-03T12:00:00Z"))).toBe(1);
  });

  it("sends one reminder when two servers run at once", async () => {
    await booked(FITTING);
    const now = new Date("2026-12-04T15:00:00Z");
    const counts = await Promise.all([sendDueReminders(database.db, now), sendDueReminders(database.db, now)]);
    expect(counts.sort()).toEqual([0, 1]);
    expect(fake.received()).toHaveLength(1);
  });

  it("gives the claim back when the service refuses, so the next run sends it", async () => {
    await fake.close();
    fake = await startFakeResend({ port: 0, failWith: { statusCode: 503, name: "application_error", message: "Try again shortly.", times: 1 } });
    vi.stubEnv("RESEND_BASE_URL", fake.url);
    const offerId = await booked(FITTING);
    expect(await sendDueReminders(database.db, new Date("2026-12-04T15:00:00Z"))).toBe(0);
    expect(await reminderSentAt(offerId)).toBeNull();
    expect(await sendDueReminders(database.db, new Date("2026-12-04T15:05:00Z"))).toBe(1);
    expect(fake.received()).toHaveLength(1);
    const [row] = await database.db.select().from(emailSend);
    expect(row).toMatchObject({ status: "sent", attempts: 2 });
  });
});
