import { describe, expect, it } from "vitest";
import { fittingSpan, fittingsHref, fittingsQuerySchema, mondayOf } from "@/lib/offers/fitting-days";

describe("the Fittings page's days", () => {
  it("starts a week on its Monday", () => {
    // 2030-01-01 is a Tuesday (ISO 8601 calendar); 2026-12-06 a Sunday.
    expect(mondayOf("2030-01-01")).toBe("2029-12-31");
    expect(mondayOf("2026-12-06")).toBe("2026-11-30");
    expect(mondayOf("2026-12-07")).toBe("2026-12-07");
  });

  it("spans a local day in the shop's zone, with the days before and after", () => {
    const span = fittingSpan("2026-12-08", "day", "America/New_York");
    expect(span.days).toEqual(["2026-12-08"]);
    expect([span.from.toISOString(), span.to.toISOString()]).toEqual(["2026-12-08T05:00:00.000Z", "2026-12-09T05:00:00.000Z"]);
    expect([span.previous, span.next]).toEqual(["2026-12-07", "2026-12-09"]);
  });

  it("spans a week across a daylight-saving change by its local days", () => {
    // New York leaves daylight time at 02:00 on Sunday 2026-11-01 (US Energy Policy Act of 2005).
    const span = fittingSpan("2026-10-28", "week", "America/New_York");
    expect(span.days).toEqual(["2026-10-26", "2026-10-27", "2026-10-28", "2026-10-29", "2026-10-30", "2026-10-31", "2026-11-01"]);
    expect([span.from.toISOString(), span.to.toISOString()]).toEqual(["2026-10-26T04:00:00.000Z", "2026-11-02T05:00:00.000Z"]);
    expect([span.previous, span.next]).toEqual(["2026-10-19", "2026-11-02"]);
  });

  it("drops a day that is no date and a view it does not know, so an old link still opens", () => {
    expect(fittingsQuerySchema.parse({ day: "2031-02-30", view: "sideways" })).toEqual({ day: undefined, view: "day" });
    expect(fittingsQuerySchema.parse({ day: "2026-12-08", view: "week" })).toEqual({ day: "2026-12-08", view: "week" });
    expect(fittingsHref("2026-12-08", "week")).toBe("/counter/fittings?day=2026-12-08&view=week");
  });
});
