import { eq } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { auditEvent, emailSend, quoteReply, quoteRequest, shop, user } from "@/db/schema";
import { createQuoteRequest } from "@/lib/quotes/create-request";
import { getQuoteRequest, listQuoteRequests, REQUEST_PAGE_SIZE } from "@/lib/quotes/queries";
import { quoteRequestSchema } from "@/lib/quotes/quote-input";
import { changeQuoteStatus, replyToQuoteRequest } from "@/lib/quotes/staff-changes";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const staff = { id: "u-staff", name: "Ollie Brandt", email: "ollie@example.test", role: "staff" };
const shopRow = {
  name: "Marrowby Tire Works",
  streetAddress: "12 Quarry Lane",
  town: "Marrowby",
  region: "OR",
  postalCode: "97000",
  phone: "(555) 010-4477",
  email: "counter@marrowby-tire.test",
  hours: { mon: [["08:00", "18:00"]], tue: [["08:00", "18:00"]], wed: [["08:00", "18:00"]], thu: [["08:00", "18:00"]], fri: [["08:00", "18:00"]], sat: [], sun: [] },
} satisfies typeof shop.$inferInsert;

const asking = (overrides: Record<string, unknown> = {}) =>
  quoteRequestSchema.parse({
    name: "Rosa Iverley",
    email: "rosa@example.test",
    phone: "+1 555 014 2233",
    vehicle: "2019 family SUV",
    tires: "235/65R17 104H",
    source: "size-sheet",
    reference: "235/65R17",
    ...overrides,
  });

async function useFake(options: Parameters<typeof startFakeResend>[0] = {}) {
  const fake = await startFakeResend({ port: 0, ...options });
  vi.stubEnv("RESEND_BASE_URL", fake.url);
  vi.stubEnv("RESEND_API_KEY", "");
  vi.stubEnv("EMAIL_FROM", "");
  return fake;
}

describe.each(testDatabaseKinds)("quote requests on %s", (kind) => {
  let database: TestDatabase;
  let fake: FakeResend | undefined;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
    vi.spyOn(console, "error").mockImplementation(() => {});
  });
  beforeEach(async () => {
    await database.reset();
    await database.db.insert(shop).values(shopRow);
    await database.db.insert(user).values(staff);
  });
  afterEach(async () => {
    vi.unstubAllEnvs();
    await fake?.close();
    fake = undefined;
  });
  afterAll(async () => {
    vi.restoreAllMocks();
    await database?.close();
  });

  it("stores a request, e-mails it to the shop with replies going to the driver, and confirms to the driver", async () => {
    fake = await useFake();
    const created = await createQuoteRequest(database.db, asking());
    expect(created).toMatchObject({ status: "new", emailed: { shop: true, customer: true } });

    const [stored] = await database.db.select().from(quoteRequest).where(eq(quoteRequest.id, created.id));
    expect(stored).toMatchObject({ name: "Rosa Iverley", quantity: 4, source: "size-sheet", reference: "235/65R17", status: "new", preferredDay: null });

    const received = fake.received();
    const toShop = received.find((email) => email.to === shopRow.email);
    const toDriver = received.find((email) => email.to === "rosa@example.test");
    expect(toShop?.reply_to).toBe("rosa@example.test");
    expect(toShop?.subject).toBe(`Price request #${created.id}: 4 × 235/65R17 104H`);
    expect(toShop?.text).toContain("Phone: +1 555 014 2233");
    expect(toDriver?.subject).toBe(`We have your price request (#${created.id})`);
    expect(toDriver?.text).toContain("(555) 010-4477");

    const sends = await database.db.select().from(emailSend).where(eq(emailSend.reference, String(created.id)));
    expect(sends.map((send) => [send.kind, send.status]).sort()).toEqual([
      ["quote_confirmation", "sent"],
      ["quote_to_shop", "sent"],
    ]);
  });

  it.each([
    ["compare", "225-45R17,235-40R18", "225/45R17, 235/40R18"],
    ["plus", "225/45R17", "On the car now: 225/45R17 94W\nOn new wheels (load index 94 or more, speed symbol W or better): 225/40R18"],
  ] as const)("stores a request sent from the %s page with its reference, and the Counter lists it under that source", async (source, reference, tires) => {
    fake = await useFake();
    const created = await createQuoteRequest(database.db, asking({ source, reference, tires }));
    expect(created).toMatchObject({ status: "new", emailed: { shop: true, customer: true } });
    const detail = await getQuoteRequest(database.db, created.id);
    expect(detail).toMatchObject({ source, reference, tires });
    const listed = await listQuoteRequests(database.db, { page: 1 });
    expect(listed.requests.find((request) => request.id === created.id)).toMatchObject({ source });
  });

  it("confirms to one address at most 3 times a day, keeping every request and telling the shop each time", async () => {
    fake = await useFake();
    const created = [];
    for (let i = 0; i < 4; i++) created.push(await createQuoteRequest(database.db, asking({ email: "Target.Inbox@example.test" })));
    expect(created.map((request) => request.emailed)).toEqual([
      { shop: true, customer: true },
      { shop: true, customer: true },
      { shop: true, customer: true },
      { shop: true, customer: false },
    ]);
    expect(fake.received().filter((email) => email.to === "Target.Inbox@example.test")).toHaveLength(3);
    expect(fake.received().filter((email) => email.to === shopRow.email)).toHaveLength(4);
    expect(await database.db.select({ id: quoteRequest.id }).from(quoteRequest)).toHaveLength(4);
  });

  it("keeps the request when the e-mail service refuses, and records the failures", async () => {
    fake = await useFake({ failWith: { statusCode: 500, name: "application_error", message: "The service is down." } });
    const created = await createQuoteRequest(database.db, asking());
    expect(created.emailed).toEqual({ shop: false, customer: false });
    expect(await database.db.select({ id: quoteRequest.id }).from(quoteRequest)).toEqual([{ id: created.id }]);
    const sends = await database.db.select().from(emailSend);
    expect(sends.map((send) => send.status)).toEqual(["failed", "failed"]);
    expect(sends[0]?.error).toContain("The service is down.");
  });

  it("keeps a reply, marks the request answered, e-mails the driver and links the reply to its e-mail", async () => {
    fake = await useFake();
    const { id } = await createQuoteRequest(database.db, asking());
    const outcome = await replyToQuoteRequest(database.db, staff, id, "Four in stock at $129 each.\nThursday at 10 works.");
    if (outcome.status !== "sent") throw new Error(outcome.status);

    const detail = await getQuoteRequest(database.db, id);
    expect(detail?.status).toBe("answered");
    expect(detail?.replies).toEqual([
      expect.objectContaining({ authorName: "Ollie Brandt", body: "Four in stock at $129 each.\nThursday at 10 works.", emailStatus: "sent" }),
    ]);
    const [reply] = await database.db.select().from(quoteReply);
    expect(reply?.emailSendId).toBe(outcome.emailSendId);
    const [send] = await database.db.select().from(emailSend).where(eq(emailSend.id, outcome.emailSendId));
    expect(send).toMatchObject({ kind: "quote_reply", senderId: staff.id, toAddress: "rosa@example.test", status: "sent" });
    const email = fake.received().find((received) => received.subject === `About your price request (#${id})`);
    expect(email?.to).toBe("rosa@example.test");
    expect(email?.text).toContain("Thursday at 10 works.");
    const [audited] = await database.db.select().from(auditEvent).where(eq(auditEvent.subject, `#${id}`));
    expect(audited).toMatchObject({ action: "request_replied", actorEmail: staff.email });
  });

  it("keeps a reply whose e-mail failed, with the failure shown beside it", async () => {
    fake = await useFake();
    const { id } = await createQuoteRequest(database.db, asking());
    await fake.close();
    fake = await useFake({ failWith: { statusCode: 500, name: "application_error", message: "The service is down." } });
    const outcome = await replyToQuoteRequest(database.db, staff, id, "We can fit them on Friday.");
    expect(outcome.status).toBe("email_failed");
    const detail = await getQuoteRequest(database.db, id);
    expect(detail?.replies[0]).toMatchObject({ emailStatus: "failed", emailError: expect.stringContaining("The service is down.") });
  });

  it("answers not found for a reply or a status change to a request that does not exist, changing nothing", async () => {
    expect(await replyToQuoteRequest(database.db, staff, 999_999, "Hello")).toEqual({ status: "not_found" });
    expect(await changeQuoteStatus(database.db, 999_999, "closed")).toBe(false);
    expect(await database.db.select().from(quoteReply)).toEqual([]);
  });

  it("changes a request's status, and lists requests newest first by status with counts and pages", async () => {
    fake = await useFake();
    const ids: number[] = [];
    for (let i = 0; i < REQUEST_PAGE_SIZE + 2; i++) ids.push((await createQuoteRequest(database.db, asking({ name: `Driver ${i}` }))).id);
    expect(await changeQuoteStatus(database.db, ids[0]!, "closed")).toBe(true);
    expect(await changeQuoteStatus(database.db, ids[1]!, "answered")).toBe(true);
    expect(await changeQuoteStatus(database.db, ids[1]!, "new")).toBe(true);
    expect(await changeQuoteStatus(database.db, ids[2]!, "answered")).toBe(true);

    const first = await listQuoteRequests(database.db, { page: 1 });
    expect(first.counts).toEqual({ new: REQUEST_PAGE_SIZE, answered: 1, offered: 0, closed: 1 });
    expect(first.total).toBe(REQUEST_PAGE_SIZE + 2);
    expect(first.pageCount).toBe(2);
    expect(first.requests[0]?.id).toBe(ids.at(-1));
    expect(first.requests).toHaveLength(REQUEST_PAGE_SIZE);
    expect((await listQuoteRequests(database.db, { page: 2 })).requests.map((row) => row.id)).toEqual([ids[1], ids[0]]);

    const closed = await listQuoteRequests(database.db, { status: "closed", page: 1 });
    expect(closed.requests.map((row) => row.id)).toEqual([ids[0]]);
    expect(closed.total).toBe(1);
  });
});
