import { describe, expect, it } from "vitest";
import { safetySummary } from "@/content/safety";
import { renderEmail } from "@/lib/email/render-email";
import { fittingBookedEmail, fittingBookedShopEmail, fittingCancelledEmail, fittingReminderEmail } from "@/lib/offers/fitting-email-content";
import { offerEmail } from "@/lib/offers/offer-email-content";
import { bookedFacts } from "./offer-facts-fixture";

const openFacts = { ...bookedFacts, status: "open" as const, fitting: null };
const bookedAt = new Date("2026-12-01T15:30:00Z");

/** Both versions of an e-mail, the HTML with its tags and entities taken out, so that a check reads words. */
async function bothVersions(message: Parameters<typeof renderEmail>[0]) {
  const rendered = await renderEmail(message);
  const htmlWords = rendered.html.replace(/<[^>]+>/g, " ").replace(/&amp;/g, "&").replace(/&#x27;/g, "'").replace(/&quot;/g, '"').replace(/\s+/g, " ");
  return { rendered, versions: [rendered.text, htmlWords] };
}

describe("the offer e-mail", () => {
  it("carries each tire, the frozen breakdown and the total in both the text and the HTML", async () => {
    const { versions } = await bothVersions(offerEmail(openFacts));
    for (const version of versions) {
      expect(version).toContain("4 × Testwell Fixture touring 225/65R17 102H, $182.99 each");
      for (const figure of ["Tires (4 tires)", "$731.96", "Fitting", "$100.00", "Disposal & fees", "$20.00", "Tax", "$61.48", "Total", "$913.44"]) {
        expect(version).toContain(figure);
      }
    }
  });

  it("links to the offer page in both versions, as a button in HTML", async () => {
    const { rendered, versions } = await bothVersions(offerEmail(openFacts));
    for (const version of versions) expect(version).toContain(bookedFacts.offerUrl);
    expect(rendered.html).toContain(`href="${bookedFacts.offerUrl}"`);
  });

  it("says until which date in the shop's zone it holds, names the vehicle, sets the staff's note apart and shows the cautions", async () => {
    const message = offerEmail(openFacts);
    const { versions } = await bothVersions(message);
    for (const version of versions) {
      expect(version).toContain("holds until the end of December 3, 2026 (the shop's time, America/New_York)");
      expect(version).toContain("2019 family SUV");
      expect(version).toContain(safetySummary);
    }
    expect(message.blocks).toContainEqual({ kind: "note", title: "A note from Marrowby Tire Works", text: "We have these on the rack.\nAsk for Ollie." });
    expect(offerEmail({ ...openFacts, message: "  " }).blocks.some((block) => block.kind === "note")).toBe(false);
  });
});

describe("the fitting e-mails", () => {
  it("tell the driver the time in the shop's zone, naming it, the address, what to bring and the cancel cut-off", async () => {
    const { versions } = await bothVersions(fittingBookedEmail(bookedFacts, bookedAt));
    for (const version of versions) {
      expect(version).toContain("Dec 5, 2026, 9:00 AM EST (the shop's time, America/New_York)");
      expect(version).toContain("410 Foundry Street, Halvering, OH 43999");
      expect(version).toContain("locking wheel nuts");
      expect(version).toContain("Allow about 60 minutes");
      // 24 hours before 09:00 EST on December 5.
      expect(version).toContain("cancel on your offer page until Dec 4, 2026, 9:00 AM EST; after that, phone Marrowby Tire Works at (555) 014-2290");
      expect(version).toContain(bookedFacts.offerUrl);
      expect(version).toContain(safetySummary);
    }
  });

  it("send the driver to the phone once the cut-off has passed", async () => {
    const { versions } = await bothVersions(fittingReminderEmail(bookedFacts, new Date("2026-12-04T14:00:00Z")));
    for (const version of versions) {
      expect(version).toContain("phone Marrowby Tire Works at (555) 014-2290: it is too late to cancel on the offer page");
      expect(version).not.toContain("cancel on your offer page until");
    }
  });

  it("give the shop the driver's contact, the bay, the tires and the Counter's link", async () => {
    const { versions } = await bothVersions(fittingBookedShopEmail(bookedFacts));
    for (const version of versions) {
      for (const fact of ["Rosa Iverley", "rosa@example.test", "+1 555 014 2233", "Bay: 2", "Testwell Fixture touring 225/65R17 102H", "$913.44", bookedFacts.counterUrl]) {
        expect(version).toContain(fact);
      }
    }
  });

  it("tell the driver a cancelled fitting's time and that the tires are no longer held", async () => {
    const { versions } = await bothVersions(fittingCancelledEmail(bookedFacts));
    for (const version of versions) {
      expect(version).toContain("your tire fitting on Dec 5, 2026, 9:00 AM EST (the shop's time, America/New_York) is cancelled");
      expect(version).toContain("no longer held");
    }
  });
});
