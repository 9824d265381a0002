import ICAL from "ical.js";
import { describe, expect, it } from "vitest";
import { fittingCalendarAttachment } from "@/lib/offers/fitting-calendar-file";
import { bookedFacts } from "./offer-facts-fixture";

const stamp = new Date("2026-12-01T15:30:00Z");

function read(attachment: ReturnType<typeof fittingCalendarAttachment>) {
  const text = Buffer.from(attachment.content as Uint8Array).toString("utf8");
  const calendar = new ICAL.Component(ICAL.parse(text));
  return { text, calendar, event: calendar.getFirstSubcomponent("vevent")! };
}

/** RFC 5545 section 3.1: a line break followed by one space or tab continues the line before. */
const unfold = (text: string) => text.replace(/\r\n[ \t]/g, "");

describe("the booked fitting's calendar attachment", () => {
  const attachment = fittingCalendarAttachment(bookedFacts, "PUBLISH", stamp);
  const { text, calendar, event } = read(attachment);

  it("is fitting.ics, typed text/calendar with its method (RFC 5545 section 8.1 registers text/calendar and its method parameter)", () => {
    expect(attachment.filename).toBe("fitting.ics");
    expect(attachment.contentType).toBe("text/calendar; charset=utf-8; method=PUBLISH");
  });

  it("says METHOD:PUBLISH (section 3.7.2), the fitting's UID on the site's host (3.8.4.7) and the offer's SEQUENCE (3.8.7.4)", () => {
    expect(calendar.getFirstPropertyValue("method")).toBe("PUBLISH");
    expect(event.getFirstPropertyValue("uid")).toBe("fitting-42@sidewise.example.test");
    expect(event.getFirstPropertyValue("sequence")).toBe(0);
  });

  it("writes DTSTART, DTEND and DTSTAMP in the UTC form with Z (sections 3.3.5 and 3.8.7.2): 09:00 in New York is 14:00 UTC", () => {
    const unfolded = unfold(text);
    expect(unfolded).toContain("\r\nDTSTART:20261205T140000Z\r\n");
    expect(unfolded).toContain("\r\nDTEND:20261205T150000Z\r\n");
    expect(unfolded).toContain("\r\nDTSTAMP:20261201T153000Z\r\n");
    const start = event.getFirstPropertyValue("dtstart") as ICAL.Time;
    expect(start.zone).toBe(ICAL.Timezone.utcTimezone);
    expect(start.toJSDate().toISOString()).toBe("2026-12-05T14:00:00.000Z");
  });

  it("puts the shop's full address in LOCATION (section 3.8.1.7), the shop as ORGANIZER (3.8.4.3) and the tires and the offer link in DESCRIPTION (3.8.1.5)", () => {
    expect(event.getFirstPropertyValue("location")).toBe("Marrowby Tire Works, 410 Foundry Street, Halvering, OH 43999");
    expect(event.getFirstPropertyValue("organizer")).toBe("mailto:counter@marrowby-tire.test");
    expect(event.getFirstProperty("organizer")!.getParameter("cn")).toBe("Marrowby Tire Works");
    expect(event.getFirstPropertyValue("summary")).toBe("Tire fitting at Marrowby Tire Works");
    const description = String(event.getFirstPropertyValue("description"));
    expect(description).toContain("4 × Testwell Fixture touring 225/65R17 102H, $182.99 each");
    expect(description).toContain(bookedFacts.offerUrl);
  });
});

describe("the cancelled fitting's calendar attachment", () => {
  it("says METHOD:CANCEL and STATUS:CANCELLED with the same UID and the raised SEQUENCE (RFC 5545 sections 3.7.2, 3.8.1.11, 3.8.7.4)", () => {
    const raised = { ...bookedFacts, fitting: { ...bookedFacts.fitting, calendarSequence: 1 } };
    const attachment = fittingCalendarAttachment(raised, "CANCEL", new Date("2026-12-03T18:00:00Z"));
    const { calendar, event } = read(attachment);
    expect(attachment.contentType).toBe("text/calendar; charset=utf-8; method=CANCEL");
    expect(calendar.getFirstPropertyValue("method")).toBe("CANCEL");
    expect(event.getFirstPropertyValue("status")).toBe("CANCELLED");
    expect(event.getFirstPropertyValue("uid")).toBe("fitting-42@sidewise.example.test");
    expect(event.getFirstPropertyValue("sequence")).toBe(1);
  });
});
