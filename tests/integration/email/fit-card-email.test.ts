import { eq } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { auditEvent, emailSend, rateLimitHit, user } from "@/db/schema";
import { emailFitCard } from "@/lib/email/fit-card-email-request";
import { listFitCardSends, listRecentSends } from "@/lib/email/queries";
import { newFitCardSchema } from "@/lib/fit-cards/card-input";
import { createFitCard } from "@/lib/fit-cards/create-card";
import { revokeFitCard } from "@/lib/fit-cards/revoke-card";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { seedFixture } from "../catalog/fixtures";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const staff = { id: "u-staff", name: "Ollie", email: "ollie@example.test", role: "staff" };
const body = { to: "pat.reader@example.test", message: "Ask for Ollie" };

describe.each(testDatabaseKinds)("e-mailing a Fit card on %s", (kind) => {
  let database: TestDatabase;
  let fake: FakeResend;
  const newCard = async () => {
    const saved = await createFitCard(database.db, staff.id, newFitCardSchema.parse({ sizes: ["225/45R17", "225/40R18"], skus: ["EM-17"], loadIndex: 91, speedSymbol: "V" }));
    if (!saved.ok) throw new Error(saved.message);
    return saved.slug;
  };
  const email = (slug: string, clientKey: string | null = null) => emailFitCard(database.db, { sender: staff, slug, link: `https://shop.example.test/s/${slug}`, body, clientKey });

  beforeAll(async () => {
    fake = await startFakeResend({ port: 0 });
    vi.stubEnv("RESEND_BASE_URL", fake.url);
    vi.stubEnv("RESEND_API_KEY", "");
    vi.stubEnv("FIT_CARD_EMAIL_LIMIT_PER_HOUR", "3");
    database = await openTestDatabase(kind);
    await database.db.insert(user).values(staff);
    await seedFixture(database.db, [{ sku: "EM-17", designation: "225/45R17", loadIndex: 94, speedSymbol: "W", priceCents: 15_900 }]);
  });
  afterAll(async () => {
    await database?.close();
    await fake.close();
    vi.unstubAllEnvs();
  });
  afterEach(async () => {
    await database.db.delete(rateLimitHit);
  });

  it("sends the card with its tire's price today, records it under the card, and lists it for staff", async () => {
    const slug = await newCard();
    const outcome = await email(slug, "client-key-1");
    if (outcome.status !== "attempted" || !outcome.result.ok) throw new Error(JSON.stringify(outcome));

    const [received] = fake.received();
    expect(received?.text).toContain(`https://shop.example.test/s/${slug}`);
    expect(received?.text).toContain("$159.00 each today");
    const [row] = await database.db.select().from(emailSend).where(eq(emailSend.id, outcome.result.id));
    expect(row).toMatchObject({ kind: "fit_card", reference: slug, idempotencyKey: `fit-card:${slug}:client-key-1`, status: "sent" });
    expect(await listFitCardSends(database.db, slug)).toEqual([expect.objectContaining({ senderName: "Ollie", toAddress: body.to, status: "sent", attempts: 1 })]);
    expect((await listRecentSends(database.db)).map((send) => send.reference)).toContain(slug);
    const audited = await database.db.select().from(auditEvent).where(eq(auditEvent.subject, slug));
    expect(audited).toEqual([expect.objectContaining({ action: "fit_card_emailed", actorEmail: staff.email, summary: `Fit card ${slug} e-mailed to ${body.to}` })]);
    // The same key again sends nothing, and records nothing again.
    await email(slug, "client-key-1");
    expect(await database.db.$count(auditEvent, eq(auditEvent.subject, slug))).toBe(1);
  });

  it("refuses a withdrawn card and an unknown one without sending, and stops at the hour's limit", async () => {
    const slug = await newCard();
    await revokeFitCard(database.db, staff, slug);
    expect(await email(slug)).toEqual({ status: "withdrawn", why: "revoked" });
    expect(await email("N".repeat(24))).toEqual({ status: "missing" });

    const open = await newCard();
    const statuses = [];
    for (let sent = 0; sent < 4; sent += 1) statuses.push((await email(open)).status);
    expect(statuses).toEqual(["attempted", "attempted", "attempted", "rate_limited"]);
  });
});
