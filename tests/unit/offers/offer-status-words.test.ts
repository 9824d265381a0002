import { describe, expect, it } from "vitest";
import { offerStatusWords } from "@/components/offers/offer-status-words";
import { refusedOffer } from "@/lib/offers/refusals";

const offer = { validUntilDate: "2026-12-08", timeZone: "America/New_York" };

describe("an offer's status in words", () => {
  it("says until when an open offer holds, naming the shop's zone", () => {
    expect(offerStatusWords({ ...offer, status: "open" })).toEqual({
      label: "Open",
      text: "Accept it by choosing a fitting time before the end of Tuesday, December 8, 2026 (America/New_York time).",
    });
  });

  it("says a gone offer is gone and how to get a new one, in the API's own words", () => {
    for (const status of ["expired", "withdrawn", "cancelled"] as const) {
      const words = offerStatusWords({ ...offer, status });
      expect(words.text).toBe(refusedOffer(status).message);
      expect(words.text).toContain("ask the shop for a new one");
    }
  });
});
