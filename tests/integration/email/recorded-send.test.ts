import { eq } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { emailSend, user } from "@/db/schema";
import { type RecordedEmail, sendRecordedEmail } from "@/lib/email/recorded-send";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const sender = { id: "u-staff", name: "Ollie", email: "ollie@example.test", role: "staff" };
const link = "https://sidewise.example.test/s/abc123";

function cardEmail(idempotencyKey: string, to = "pat.reader@example.test"): RecordedEmail {
  return {
    senderId: sender.id,
    kind: "fit_card",
    reference: "abc123",
    to,
    message: { subject: "Your Fit card: 225/45R17 and 225/40R18", blocks: [{ kind: "button", label: "Open your card", href: link }] },
    idempotencyKey,
  };
}

function useService(url: string) {
  vi.stubEnv("RESEND_BASE_URL", url);
  vi.stubEnv("RESEND_API_KEY", "");
  vi.stubEnv("EMAIL_FROM", "");
}

async function rowFor(database: TestDatabase, idempotencyKey: string) {
  const [row] = await database.db.select().from(emailSend).where(eq(emailSend.idempotencyKey, idempotencyKey));
  return row;
}

describe.each(testDatabaseKinds)("sendRecordedEmail on %s", (kind) => {
  let database: TestDatabase;
  let fake: FakeResend;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    await database.db.insert(user).values(sender);
    vi.spyOn(console, "error").mockImplementation(() => {});
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    await database?.close();
  });
  afterEach(async () => {
    vi.unstubAllEnvs();
    await fake?.close();
  });

  it("sends through the real SDK, records the provider's id, and hands the service the recipient, subject and link", async () => {
    fake = await startFakeResend({ port: 0 });
    useService(fake.url);
    const result = await sendRecordedEmail(database.db, cardEmail("key-first"));

    if (!result.ok) throw new Error(result.message);
    expect(result.alreadySent).toBe(false);
    const [received] = fake.received();
    expect(fake.received()).toHaveLength(1);
    expect(received).toMatchObject({ id: result.providerId, to: "pat.reader@example.test", subject: "Your Fit card: 225/45R17 and 225/40R18" });
    expect(received?.text).toContain(link);
    expect(received?.html).toContain(`href="${link}"`);
    expect(await rowFor(database, "key-first")).toMatchObject({
      id: result.id,
      status: "sent",
      providerId: result.providerId,
      attempts: 1,
      senderId: sender.id,
      kind: "fit_card",
      reference: "abc123",
      error: null,
    });
  });

  it("records a provider failure, and a retry with the same key delivers exactly one e-mail", async () => {
    fake = await startFakeResend({ port: 0, failWith: { statusCode: 503, name: "application_error", message: "Try again shortly.", times: 1 } });
    useService(fake.url);

    const first = await sendRecordedEmail(database.db, cardEmail("key-retry"));
    expect(first).toMatchObject({ ok: false, message: expect.stringContaining("Try again shortly.") });
    expect(await rowFor(database, "key-retry")).toMatchObject({ status: "failed", attempts: 1, providerId: null });
    expect(fake.received()).toHaveLength(0);

    const retry = await sendRecordedEmail(database.db, cardEmail("key-retry"));
    if (!retry.ok) throw new Error(retry.message);
    expect(retry).toMatchObject({ id: first.id, alreadySent: false });
    expect(await rowFor(database, "key-retry")).toMatchObject({ status: "sent", attempts: 2, error: null, providerId: retry.providerId });
    expect(fake.received()).toHaveLength(1);
  });

  it("answers a key already sent with the earlier send and sends nothing", async () => {
    fake = await startFakeResend({ port: 0 });
    useService(fake.url);
    const first = await sendRecordedEmail(database.db, cardEmail("key-twice"));
    const second = await sendRecordedEmail(database.db, cardEmail("key-twice"));

    if (!first.ok || !second.ok) throw new Error("both calls should succeed");
    expect(second).toEqual({ ok: true, id: first.id, providerId: first.providerId, alreadySent: true });
    expect(fake.received()).toHaveLength(1);
    expect(await rowFor(database, "key-twice")).toMatchObject({ attempts: 1 });
  });

  it("keeps different keys apart", async () => {
    fake = await startFakeResend({ port: 0 });
    useService(fake.url);
    const one = await sendRecordedEmail(database.db, cardEmail("key-a", "one@example.test"));
    const two = await sendRecordedEmail(database.db, cardEmail("key-b", "two@example.test"));

    expect(one.id).not.toBe(two.id);
    expect(fake.received().map((email) => email.to)).toEqual(["two@example.test", "one@example.test"]);
  });
});
