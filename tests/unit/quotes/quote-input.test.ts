import { afterEach, describe, expect, it, vi } from "vitest";
import { MAX_FORM_AGE_MS, signFormToken, spamVerdict } from "@/lib/quotes/form-token";
import { MIN_FILL_MS, quoteFieldErrors, quoteRequestSchema } from "@/lib/quotes/quote-input";

const valid = {
  name: "Rosa Iverley",
  email: "rosa@example.test",
  vehicle: "2019 family SUV",
  tires: "235/65R17 104H",
  source: "size-sheet",
  reference: "235/65R17",
};

function errorsOf(input: Record<string, unknown>) {
  const parsed = quoteRequestSchema.safeParse(input);
  return parsed.success ? {} : quoteFieldErrors(parsed.error);
}

afterEach(() => vi.useRealTimers());

describe("the request schema", () => {
  it("accepts a request and fills in four tires", () => {
    const parsed = quoteRequestSchema.parse({ ...valid, phone: "", preferredDay: "" });
    expect(parsed).toMatchObject({ ...valid, quantity: 4 });
    expect(parsed.phone).toBeUndefined();
    expect(parsed.preferredDay).toBeUndefined();
  });

  it("says for each missing field what to type", () => {
    expect(errorsOf({ source: "finder" })).toEqual({
      name: "Type your name so the shop knows who is asking",
      email: "Type your e-mail address: the shop answers there",
      vehicle: "Say which vehicle the tires are for, such as “2019 family SUV”",
      tires: "Say which tires or size you would like a price for",
    });
  });

  it("names the wrong field and how to put it right", () => {
    expect(errorsOf({ ...valid, email: "rosa.example.test" })).toEqual({ email: "Check the e-mail address: it should look like name@example.com" });
    expect(errorsOf({ ...valid, phone: "call me maybe" })).toEqual({ phone: "Use only digits, spaces and + ( ) - in the phone number" });
    expect(errorsOf({ ...valid, phone: "+1 (555)" })).toEqual({ phone: "A phone number needs at least 7 digits" });
    expect(errorsOf({ ...valid, quantity: 17 })).toEqual({ quantity: "Choose how many tires, 1 to 16" });
    expect(errorsOf({ ...valid, quantity: "0" })).toEqual({ quantity: "Choose how many tires, 1 to 16" });
    expect(errorsOf({ ...valid, quantity: 2.5 })).toEqual({ quantity: "Choose a whole number of tires, 1 to 16" });
    expect(errorsOf({ ...valid, source: "elsewhere" })).toEqual({ source: "The page the request comes from is unknown" });
  });

  it("takes a phone number with spaces, + ( ) and -", () => {
    expect(errorsOf({ ...valid, phone: "+1 (555) 014-2233" })).toEqual({});
  });

  it("takes a preferred day from today to 90 days ahead, and no other", () => {
    vi.useFakeTimers({ now: new Date("2026-12-02T15:00:00Z"), toFake: ["Date"] });
    expect(errorsOf({ ...valid, preferredDay: "2026-12-02" })).toEqual({});
    expect(errorsOf({ ...valid, preferredDay: "2027-03-02" })).toEqual({});
    const range = "Pick a day from today to 90 days ahead, or leave it empty";
    expect(errorsOf({ ...valid, preferredDay: "2026-11-20" })).toEqual({ preferredDay: range });
    expect(errorsOf({ ...valid, preferredDay: "2027-03-05" })).toEqual({ preferredDay: range });
    expect(errorsOf({ ...valid, preferredDay: "2027-02-30" })).toEqual({ preferredDay: "That day does not exist: pick another" });
    expect(errorsOf({ ...valid, preferredDay: "next Tuesday" })).toEqual({ preferredDay: "Pick the day as a date, such as 2026-12-24" });
  });

  it("allows yesterday in UTC, which is still today west of UTC", () => {
    vi.useFakeTimers({ now: new Date("2026-12-03T02:00:00Z"), toFake: ["Date"] });
    expect(errorsOf({ ...valid, preferredDay: "2026-12-02" })).toEqual({});
  });
});

describe("spam resistance", () => {
  const secret = "a-test-secret-of-at-least-thirty-two-characters";
  const now = 1_800_000_000_000;
  const verdict = (input: { website?: string; renderedAt?: string }) => spamVerdict(input, now, secret);

  it("lets a person through whose form the server opened a few seconds ago, hidden field left empty", () => {
    expect(verdict({ website: "", renderedAt: signFormToken(now - 12_000, secret) })).toEqual({ ok: true });
    expect(verdict({ website: "   ", renderedAt: signFormToken(now - MIN_FILL_MS, secret) })).toEqual({ ok: true });
    expect(verdict({ renderedAt: signFormToken(now - MAX_FORM_AGE_MS, secret) })).toEqual({ ok: true });
  });

  it("refuses a filled-in hidden field", () => {
    expect(verdict({ website: "http://cheap-pills.example", renderedAt: signFormToken(now - 20_000, secret) })).toEqual({ ok: false, reason: "honeypot" });
  });

  it("refuses a form sent within 3 s of opening, or opened over a day ago", () => {
    expect(verdict({ renderedAt: signFormToken(now - MIN_FILL_MS + 1, secret) })).toEqual({ ok: false, reason: "too_young" });
    expect(verdict({ renderedAt: signFormToken(now + 60_000, secret) })).toEqual({ ok: false, reason: "too_young" });
    expect(verdict({ renderedAt: signFormToken(now - MAX_FORM_AGE_MS - 1, secret) })).toEqual({ ok: false, reason: "too_old" });
  });

  it("refuses a time the server did not sign: missing, typed by the client, or signed with another secret", () => {
    const genuine = signFormToken(now - 20_000, secret);
    expect(verdict({})).toEqual({ ok: false, reason: "not_signed" });
    expect(verdict({ renderedAt: String(now - 20_000) })).toEqual({ ok: false, reason: "not_signed" });
    expect(verdict({ renderedAt: genuine.replace(/^\d+/, String(now - 40_000)) })).toEqual({ ok: false, reason: "not_signed" });
    expect(verdict({ renderedAt: signFormToken(now - 20_000, "another-secret-of-at-least-thirty-two-chars") })).toEqual({ ok: false, reason: "not_signed" });
  });
});
