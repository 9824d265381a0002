import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { fittingCalendar, type FittingEvent } from "@/lib/fittings";

// The invented demo shop; the fitting is at 09:00 in New York (-05:00), 14:00 UTC.
const published = {
  method: "PUBLISH",
  uid: "fitting-42@sidewise.test",
  sequence: 0,
  stamp: "2026-12-01T15:30:00Z",
  start: "2026-12-05T09:00:00-05:00",
  end: "2026-12-05T10:00:00-05:00",
  summary: "Tire fitting at Marrowby Tire Works",
  description:
    "Four tires held on the rack for you: 225/65R17 102H, mounted and balanced.\nBring the wheel lock key; allow about an hour, café across the street 🛞. " +
    "Ask for the counter; we will take it from there, rain or shine.",
  location: "410 Foundry Street, Halvering, OH 43999",
  organizer: { name: "Marrowby Tire Works", email: "counter@marrowby-tire.test" },
} satisfies FittingEvent;

const cancelled = { ...published, method: "CANCEL", sequence: 1, stamp: "2026-12-03T18:00:00Z" } satisfies FittingEvent;

function parse(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  const event = calendar.getFirstSubcomponent("vevent")!;
  return { calendar, event };
}

/** RFC 5545 section 3.1: a line break followed by one space or tab continues the line before. */
const unfold = (text: string) => text.replace(/\r\n[ \t]/g, "");

describe("a fitting as an iCalendar object", () => {
  const text = fittingCalendar(published);

  it("uses CRLF after every line and folds none longer than 75 octets (RFC 5545 section 3.1)", () => {
    expect(text.endsWith("\r\n")).toBe(true);
    expect(text.replace(/\r\n/g, "")).not.toMatch(/[\r\n]/);
    const lines = text.split("\r\n").slice(0, -1);
    expect(lines.every((line) => Buffer.byteLength(line, "utf8") <= 75)).toBe(true);
    expect(lines.some((line) => line.startsWith(" "))).toBe(true); // the description was long enough to fold
  });

  it("reads back with an independent parser, every text as written", () => {
    const { calendar, event } = parse(text);
    expect(calendar.getFirstPropertyValue("version")).toBe("2.0");
    expect(event.getFirstPropertyValue("summary")).toBe(published.summary);
    expect(event.getFirstPropertyValue("description")).toBe(published.description);
    // The shop's address is the LOCATION (RFC 5545 section 3.8.1.7), its commas escaped and read back.
    expect(event.getFirstPropertyValue("location")).toBe(published.location);
    const organizer = event.getFirstProperty("organizer")!;
    expect(organizer.getParameter("cn")).toBe("Marrowby Tire Works");
    expect(String(organizer.getFirstValue()).toLowerCase()).toBe("mailto:counter@marrowby-tire.test");
  });

  it("says METHOD:PUBLISH (RFC 5545 section 3.7.2), its UID (3.8.4.7) and SEQUENCE 0 (3.8.7.4)", () => {
    const { calendar, event } = parse(text);
    expect(calendar.getFirstPropertyValue("method")).toBe("PUBLISH");
    expect(event.getFirstPropertyValue("uid")).toBe("fitting-42@sidewise.test");
    expect(event.getFirstPropertyValue("sequence")).toBe(0);
    expect(event.getFirstPropertyValue("status")).toBe("CONFIRMED");
  });

  it("writes DTSTAMP, DTSTART and DTEND in the UTC form with Z (RFC 5545 sections 3.3.5 and 3.8.7.2)", () => {
    const unfolded = unfold(text);
    expect(unfolded).toContain("\r\nDTSTAMP:20261201T153000Z\r\n");
    expect(unfolded).toContain("\r\nDTSTART:20261205T140000Z\r\n");
    expect(unfolded).toContain("\r\nDTEND:20261205T150000Z\r\n");
    const { event } = parse(text);
    for (const [property, instant] of [["dtstamp", "2026-12-01T15:30:00.000Z"], ["dtstart", "2026-12-05T14:00:00.000Z"], ["dtend", "2026-12-05T15:00:00.000Z"]]) {
      const time = event.getFirstPropertyValue(property) as ICAL.Time;
      expect(time.zone).toBe(ICAL.Timezone.utcTimezone);
      expect(time.toJSDate().toISOString()).toBe(instant);
    }
  });
});

describe("a cancelled fitting", () => {
  it("keeps the UID, raises the SEQUENCE and says CANCEL and CANCELLED (RFC 5545 sections 3.7.2, 3.8.7.4, 3.8.1.11)", () => {
    const before = parse(fittingCalendar(published));
    const after = parse(fittingCalendar(cancelled));
    expect(after.calendar.getFirstPropertyValue("method")).toBe("CANCEL");
    expect(after.event.getFirstPropertyValue("uid")).toBe(before.event.getFirstPropertyValue("uid"));
    expect(Number(after.event.getFirstPropertyValue("sequence"))).toBeGreaterThan(Number(before.event.getFirstPropertyValue("sequence")));
    expect(after.event.getFirstPropertyValue("status")).toBe("CANCELLED");
  });
});

describe("input a calendar cannot carry", () => {
  const refusal = (change: Partial<FittingEvent>) => () => fittingCalendar({ ...published, ...change } as FittingEvent);

  it("is refused with the field named", () => {
    expect(refusal({ uid: "fitting 42" })).toThrow(/^calendar\.uid: a UID is 1–255 visible ASCII characters/);
    expect(refusal({ sequence: -1 })).toThrow(/^calendar\.sequence/);
    expect(refusal({ end: "2026-12-05T08:00:00-05:00" })).toThrow(/^calendar\.end: a fitting ends after it starts/);
    expect(refusal({ start: "2026-12-05T09:00:00" })).toThrow(/^calendar\.start: an instant is a date and time with its offset/);
    expect(refusal({ summary: "Fitting\u0000" })).toThrow(/^calendar\.summary: Remove the control characters/);
    expect(refusal({ organizer: { name: "Marrowby", email: "not an address" } })).toThrow(/^calendar\.organizer\.email/);
  });
});
