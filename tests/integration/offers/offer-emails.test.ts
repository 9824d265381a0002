import { eq } from "drizzle-orm";
import ICAL from "ical.js";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { emailSend, offer } from "@/db/schema";
import { sendFittingBookedEmails, sendFittingCancelledEmails, sendOfferEmail } from "@/lib/offers/offer-emails";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";
import { insertOffer, seedOfferWorld } from "./offer-rows";

const SITE = "https://sidewise.example.test";
const bookedAt = new Date("2026-12-01T15:30:00Z");

/** The calendar a received e-mail carries, read back from the fake by the e-mail's id as any client would. */
async function calendarOf(fake: FakeResend, id: string) {
  const stored = (await (await fetch(`${fake.url}/emails/${id}`)).json()) as { attachments?: { filename: string; content: string; content_type: string }[] };
  const [attachment] = stored.attachments ?? [];
  if (!attachment) throw new Error(`e-mail ${id} has no attachment`);
  const calendar = new ICAL.Component(ICAL.parse(Buffer.from(attachment.content, "base64").toString("utf8")));
  return { attachment, calendar, event: calendar.getFirstSubcomponent("vevent")! };
}

describe.each(testDatabaseKinds)("the offer and fitting e-mails on %s", (kind) => {
  let database: TestDatabase;
  let fake: FakeResend;
  let world: { requestId: number; stockItemId: number };
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
    vi.stubEnv("SITE_URL", SITE);
  });
  afterEach(async () => {
    vi.unstubAllEnvs();
    await fake.close();
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    await database?.close();
  });

  it("sends the open offer to the driver once, with the link to its page, replies going to the shop", async () => {
    const offerId = await insertOffer(database.db, { ...world, token: "OfferTokenAbcdefghijklmn" });
    expect(await sendOfferEmail(database.db, offerId)).toEqual({ ok: true });
    expect(await sendOfferEmail(database.db, offerId)).toEqual({ ok: true });

    const received = fake.received();
    expect(received).toHaveLength(1);
    expect(received[0]).toMatchObject({ to: "rosa@example.test", reply_to: "counter@marrowby-tire.test" });
    expect(received[0]?.text).toContain(`${SITE}/o/OfferTokenAbcdefghijklmn`);
    expect(received[0]?.text).toContain("$913.44");
    const [row] = await database.db.select().from(emailSend).where(eq(emailSend.idempotencyKey, `offer-${offerId}`));
    expect(row).toMatchObject({ kind: "offer", reference: String(offerId), status: "sent", attempts: 1 });
  });

  it("sends no offer that is no longer open, and none for an offer that does not exist", async () => {
    const offerId = await insertOffer(database.db, { ...world, token: "WithdrawnTokenAbcdefghij", status: "withdrawn" });
    expect(await sendOfferEmail(database.db, offerId)).toEqual({ ok: false });
    expect(await sendOfferEmail(database.db, offerId + 1000)).toEqual({ ok: false });
    expect(fake.received()).toHaveLength(0);
  });

  it("sends the booked fitting to the driver and the shop, each with a PUBLISH calendar the fake keeps (RFC 5545 sections 3.7.2, 3.8.4.7, 3.8.7.4)", async () => {
    const offerId = await insertOffer(database.db, { ...world, token: "BookedTokenAbcdefghijklm", fittingStart: "2026-12-05T14:00:00Z" });
    expect(await sendFittingBookedEmails(database.db, offerId, bookedAt)).toEqual({ ok: true });

    const received = fake.received();
    expect(received.map((email) => email.to).sort()).toEqual(["counter@marrowby-tire.test", "rosa@example.test"]);
    for (const email of received) {
      const { attachment, calendar, event } = await calendarOf(fake, email.id);
      expect(attachment).toMatchObject({ filename: "fitting.ics", content_type: "text/calendar; charset=utf-8; method=PUBLISH" });
      expect(calendar.getFirstPropertyValue("method")).toBe("PUBLISH");
      expect(event.getFirstPropertyValue("uid")).toBe(`fitting-${offerId}@sidewise.example.test`);
      expect(event.getFirstPropertyValue("sequence")).toBe(0);
      expect((event.getFirstPropertyValue("dtstart") as ICAL.Time).toJSDate().toISOString()).toBe("2026-12-05T14:00:00.000Z");
      expect(event.getFirstPropertyValue("location")).toBe("Marrowby Tire Works, 410 Foundry Street, Halvering, OH 43999");
    }
    const kinds = await database.db.select({ kind: emailSend.kind, key: emailSend.idempotencyKey }).from(emailSend);
    expect(kinds.sort((a, b) => a.kind.localeCompare(b.kind))).toEqual([
      { kind: "fitting_booked", key: `fitting-booked-${offerId}-0` },
      { kind: "fitting_booked_shop", key: `fitting-booked-shop-${offerId}-0` },
    ]);

    // Sent again (a retry, a second click): nothing new is delivered.
    expect(await sendFittingBookedEmails(database.db, offerId, bookedAt)).toEqual({ ok: true });
    expect(fake.received()).toHaveLength(2);
  });

  it("sends the cancellation as METHOD:CANCEL with the same UID and the raised SEQUENCE, to the driver and the shop", async () => {
    const offerId = await insertOffer(database.db, { ...world, token: "CancelTokenAbcdefghijklm", fittingStart: "2026-12-05T14:00:00Z" });
    await sendFittingBookedEmails(database.db, offerId, bookedAt);
    expect(await sendFittingCancelledEmails(database.db, offerId, bookedAt)).toEqual({ ok: false });

    // The cancelling write changes the status and raises the sequence, then calls the sender.
    await database.db.update(offer).set({ status: "cancelled", calendarSequence: 1 }).where(eq(offer.id, offerId));
    expect(await sendFittingCancelledEmails(database.db, offerId, new Date("2026-12-03T18:00:00Z"))).toEqual({ ok: true });

    const cancellations = fake.received().filter((email) => email.subject.includes("cancelled"));
    expect(cancellations.map((email) => email.to).sort()).toEqual(["counter@marrowby-tire.test", "rosa@example.test"]);
    for (const email of cancellations) {
      const { attachment, calendar, event } = await calendarOf(fake, email.id);
      expect(attachment.content_type).toBe("text/calendar; charset=utf-8; method=CANCEL");
      expect(calendar.getFirstPropertyValue("method")).toBe("CANCEL");
      expect(event.getFirstPropertyValue("uid")).toBe(`fitting-${offerId}@sidewise.example.test`);
      expect(event.getFirstPropertyValue("sequence")).toBe(1);
    }
    expect(await sendFittingBookedEmails(database.db, offerId, bookedAt)).toEqual({ ok: false });
  });

  it("answers ok: false without throwing when the service refuses, and records the failure", async () => {
    await fake.close();
    fake = await startFakeResend({ port: 0, failWith: { statusCode: 503, name: "application_error", message: "Try again shortly." } });
    vi.stubEnv("RESEND_BASE_URL", fake.url);
    const offerId = await insertOffer(database.db, { ...world, token: "FailingTokenAbcdefghijkl", fittingStart: "2026-12-05T14:00:00Z" });
    expect(await sendFittingBookedEmails(database.db, offerId, bookedAt)).toEqual({ ok: false });
    const rows = await database.db.select({ status: emailSend.status }).from(emailSend);
    expect(rows).toEqual([{ status: "failed" }, { status: "failed" }]);
  });
});
