import { afterEach, describe, expect, it, vi } from "vitest";
import { acceptOfferAt, cancelFitting } from "@/components/offers/post-offer";

const next = [{ start: "2026-12-08T10:00:00-05:00", end: "2026-12-08T11:00:00-05:00" }];

function answering(status: number, body: unknown) {
  const fetch = vi.fn(async () => new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } }));
  vi.stubGlobal("fetch", fetch);
  return fetch;
}

afterEach(() => vi.unstubAllGlobals());

describe("the offer page's requests", () => {
  it("send the chosen start as same-origin JSON and read the booked time", async () => {
    const fetch = answering(200, { status: "accepted", appointment: next[0] });
    expect(await acceptOfferAt("tok_en", next[0]!.start)).toEqual({ ok: true, appointment: next[0] });
    expect(fetch).toHaveBeenCalledWith("/api/v1/offers/tok_en/accept", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ slotStart: next[0]!.start }),
    });
  });

  it("keep a taken time's message and the next free times", async () => {
    answering(409, { error: { code: "slot_taken", message: "That fitting time is no longer free.", nextSlots: next } });
    expect(await acceptOfferAt("tok_en", "2026-12-08T09:00:00-05:00")).toEqual({ ok: false, code: "slot_taken", message: "That fitting time is no longer free.", nextSlots: next, gone: false });
  });

  it("mark a gone offer as gone, so the page stops offering times", async () => {
    answering(410, { error: { code: "gone", message: "This offer has expired." } });
    expect(await cancelFitting("tok_en")).toMatchObject({ ok: false, code: "gone", gone: true });
  });

  it("say so plainly when the server cannot be reached", async () => {
    vi.stubGlobal("fetch", vi.fn(async () => Promise.reject(new TypeError("network"))));
    const answer = await cancelFitting("tok_en");
    expect(answer).toMatchObject({ ok: false, code: "unreachable", gone: false });
    expect(answer.ok ? "" : answer.message).toMatch(/could not be reached/);
  });
});
