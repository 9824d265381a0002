import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { sendEmail } from "@/lib/email/send-email";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";

let fake: FakeResend;
let refusing: FakeResend;

beforeAll(async () => {
  fake = await startFakeResend({ port: 0 });
  refusing = await startFakeResend({
    port: 0,
    failWith: { statusCode: 403, name: "invalid_from_address", message: "The sending domain is not verified." },
  });
});
afterAll(async () => {
  await Promise.all([fake.close(), refusing.close()]);
});
afterEach(() => {
  vi.unstubAllEnvs();
  vi.restoreAllMocks();
});

function useService(url: string) {
  vi.stubEnv("RESEND_BASE_URL", url);
  vi.stubEnv("RESEND_API_KEY", "");
  vi.stubEnv("EMAIL_FROM", "");
}

describe("sendEmail", () => {
  it("hands the service exactly what was sent, from the shop's default address", async () => {
    useService(fake.url);
    const result = await sendEmail({
      to: "ada.quill@example.test",
      subject: "Your Fit card",
      text: "Here is the card you asked for.",
      html: "<p>Here is the card you asked for.</p>",
      replyTo: "counter@marrowby-tire.test",
    });
    expect(result).toEqual({ ok: true, id: expect.any(String) });
    const received = fake.received();
    expect(received).toHaveLength(1);
    expect(received[0]).toMatchObject({
      id: result.ok ? result.id : "",
      from: "Marrowby Tire Works <counter@marrowby-tire.test>",
      to: "ada.quill@example.test",
      subject: "Your Fit card",
      text: "Here is the card you asked for.",
      html: "<p>Here is the card you asked for.</p>",
      reply_to: "counter@marrowby-tire.test",
    });
  });

  it("sends from EMAIL_FROM when it is set", async () => {
    useService(fake.url);
    vi.stubEnv("EMAIL_FROM", "Front desk <desk@marrowby-tire.test>");
    const result = await sendEmail({ to: ["a@example.test", "b@example.test"], subject: "Hello", text: "Hi" });
    expect(result.ok).toBe(true);
    expect(fake.received()[0]).toMatchObject({ from: "Front desk <desk@marrowby-tire.test>", to: ["a@example.test", "b@example.test"] });
  });

  it("answers the service's refusal as a message and logs it, without throwing", async () => {
    useService(refusing.url);
    const log = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const result = await sendEmail({ to: "ada.quill@example.test", subject: "Hello", text: "Hi" });
    expect(result).toEqual({ ok: false, message: "invalid_from_address: The sending domain is not verified." });
    expect(log).toHaveBeenCalledOnce();
  });

  it("answers a message when the service cannot be reached", async () => {
    const gone = await startFakeResend({ port: 0 });
    await gone.close();
    useService(gone.url);
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const result = await sendEmail({ to: "ada.quill@example.test", subject: "Hello", text: "Hi" });
    expect(result.ok).toBe(false);
  });

  it("refuses a malformed e-mail before calling the service", async () => {
    useService(fake.url);
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const before = fake.received().length;
    const result = await sendEmail({ to: "not an address", subject: "Hello", text: "Hi" });
    expect(result).toEqual({ ok: false, message: expect.stringMatching(/^invalid e-mail: to/) });
    expect(fake.received()).toHaveLength(before);
  });

  it("carries attachments to the service as the SDK sends them, the content in base64, read back by id", async () => {
    useService(fake.url);
    const calendar = "BEGIN:VCALENDAR\r\nVERSION:2.0\r\nEND:VCALENDAR\r\n";
    const result = await sendEmail({
      to: "ada.quill@example.test",
      subject: "Your fitting",
      text: "See you then.",
      attachments: [{ filename: "fitting.ics", content: Buffer.from(calendar, "utf8"), contentType: "text/calendar; charset=utf-8; method=PUBLISH" }],
    });
    if (!result.ok) throw new Error(result.message);
    const stored = await (await fetch(`${fake.url}/emails/${result.id}`)).json();
    expect(stored.attachments).toEqual([{ filename: "fitting.ics", content: Buffer.from(calendar).toString("base64"), content_type: "text/calendar; charset=utf-8; method=PUBLISH" }]);
    expect(Buffer.from(stored.attachments[0].content, "base64").toString("utf8")).toBe(calendar);
  });

  it.each([
    ["a file name with a path in it", { filename: "../fitting.ics", content: "QUJD", contentType: "text/calendar" }, /attachments\.0\.filename/],
    ["a file name with a space", { filename: "my fitting.ics", content: "QUJD", contentType: "text/calendar" }, /attachments\.0\.filename/],
    ["content that is not base64", { filename: "fitting.ics", content: "not base64!", contentType: "text/calendar" }, /attachments\.0\.content/],
    ["an empty file", { filename: "fitting.ics", content: new Uint8Array(0), contentType: "text/calendar" }, /attachments\.0\.content/],
    ["a file over 64 KB", { filename: "fitting.ics", content: new Uint8Array(64 * 1024 + 1), contentType: "text/calendar" }, /attachments\.0\.content/],
    ["a content type with a line break", { filename: "fitting.ics", content: "QUJD", contentType: "text/calendar\r\nBcc: x@example.test" }, /attachments\.0\.contentType/],
  ])("refuses %s before calling the service", async (_, attachment, field) => {
    useService(fake.url);
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const before = fake.received().length;
    const result = await sendEmail({ to: "ada.quill@example.test", subject: "Hello", text: "Hi", attachments: [attachment] });
    expect(result).toEqual({ ok: false, message: expect.stringMatching(field) });
    expect(fake.received()).toHaveLength(before);
  });

  it("refuses more than three attachments", async () => {
    useService(fake.url);
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const one = { filename: "a.txt", content: "QUJD", contentType: "text/plain" };
    const result = await sendEmail({ to: "ada.quill@example.test", subject: "Hello", text: "Hi", attachments: [one, one, one, one] });
    expect(result).toEqual({ ok: false, message: expect.stringMatching(/attachments/) });
  });

  it("refuses to send to a remote service without an API key", async () => {
    useService("https://mail.example.test");
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const result = await sendEmail({ to: "ada.quill@example.test", subject: "Hello", text: "Hi" });
    expect(result).toEqual({ ok: false, message: expect.stringContaining("RESEND_API_KEY") });
  });
});
