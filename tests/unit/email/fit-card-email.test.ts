import { describe, expect, it } from "vitest";
import { fitCardEmailContent } from "@/lib/email/fit-card-email-content";
import { fitCardEmail } from "@/lib/email/fit-card-email";
import { renderEmail } from "@/lib/email/render-email";
import type { CardTire, PublicFitCard } from "@/lib/fit-cards/read-card";
import type { ShopContact } from "@/lib/shop/queries";

const link = "https://sidewise.example.test/s/AbCdEfGhIjKlMnOpQrStUvWx";

const tire = (overrides: Partial<CardTire>): CardTire => ({
  sku: "BV-1",
  brand: "Brightvale",
  line: "Meadow Touring",
  designation: "225/45R17",
  loadIndex: 94,
  loadIndexDual: null,
  speedSymbol: "W",
  loadRange: null,
  extraLoad: true,
  runFlat: false,
  season: "all-season",
  terrain: "highway",
  threePeak: false,
  treadDepth32: 10,
  overallDiameterMm: 634.3,
  priceCents: 14_900,
  quantity: 6,
  inStock: true,
  diameterDiffPct: 0,
  equalOrBetter: true,
  reasons: [],
  notes: [],
  priceCentsAtSave: 15_900,
  stillStocked: true,
  estimate: { quantity: 4, tiresCents: 59_600, servicesCents: 0, feesCents: 0, taxCents: 0, totalCents: 59_600 },
  wear: null,
  ...overrides,
});

const card: PublicFitCard = {
  slug: "AbCdEfGhIjKlMnOpQrStUvWx",
  createdAt: "2026-11-02T10:00:00.000Z",
  expiresAt: null,
  sizes: ["225/45R17", "225/40R18"],
  original: {
    designation: "225/45R17",
    overallDiameterMm: 634.3,
    loadIndex: 91,
    loadIndexDual: null,
    speedSymbol: "V",
    loadRange: null,
    runFlat: false,
    minLoadIndex: null,
    minLoadIndexDual: null,
    season: null,
  },
  tolerancePct: 3,
  quantity: 4,
  note: null,
  wear: null,
  tires: [tire({}), tire({ sku: "OK-2", brand: "Okenby", line: "Ridge Sport", designation: "225/40R18", loadIndex: 92, speedSymbol: "Y", extraLoad: false, priceCents: 17_900 })],
};

const shop: ShopContact = {
  name: "Marrowby Tire Works",
  streetAddress: "12 Kiln Lane",
  town: "Marrowby",
  region: "OH",
  postalCode: "45000",
  phone: "(555) 010-2030",
  email: "counter@marrowby-tire.test",
  openingHours: "Mon–Fri 8–6, Sat 8–1",
};

const content = fitCardEmailContent({ card, shop, link, message: "Ask for Ollie <b>at the counter</b>" });

describe("Fit card e-mail", () => {
  it("words the key numbers once for both versions", () => {
    expect(content.original).toBe("225/45R17 91V");
    // Nominal geometry (ETRTO): 225/45R17 is 634.3 mm across, 225/40R18 637.2 mm, so +0.46 %, shown to a tenth.
    expect(content.otherSizes).toEqual([{ designation: "225/40R18", diameterChange: "+0.5 % overall diameter" }]);
    expect(content.tires.map((t) => `${t.name}, ${t.marking}: ${t.price}`)).toEqual([
      "Brightvale Meadow Touring, 225/45R17 94W XL: $149.00 each today",
      "Okenby Ridge Sport, 225/40R18 92Y: $179.00 each today",
    ]);
  });

  it("puts the link, the sizes, the prices, the message, the shop and the caution in the text version", async () => {
    const { text } = await renderEmail(fitCardEmail(content));
    for (const part of [link, "225/45R17 91V", "225/40R18 (+0.5 % overall diameter)", "$149.00 each today", "$179.00 each today", "Ask for Ollie <b>at the counter</b>", "(555) 010-2030", "placard", "qualified fitter"]) {
      expect(text).toContain(part);
    }
  });

  it("renders the same facts as HTML with the link as a button and the staff message escaped", async () => {
    const { html } = await renderEmail(fitCardEmail(content));
    expect(html.startsWith("<!DOCTYPE html><html")).toBe(true);
    expect(html).toContain(`href="${link}"`);
    expect(html).toContain("Open your Fit card");
    for (const part of ["225/45R17 91V", "225/40R18", "+0.5 % overall diameter", "$149.00 each today", "$179.00 each today", "(555) 010-2030", "placard", "qualified fitter"]) {
      expect(html).toContain(part);
    }
    expect(html).toContain("Ask for Ollie &lt;b&gt;at the counter&lt;/b&gt;");
    expect(html).not.toContain("<b>at the counter</b>");
    expect(html).not.toMatch(/<style|class=/);
  });

  it("says a tire is no longer stocked with its price when saved, and leaves out an empty message", async () => {
    const gone = fitCardEmailContent({ card: { ...card, tires: [tire({ stillStocked: false })] }, shop: null, link, message: "   " });
    expect(gone.tires[0]?.price).toBe("$159.00 when saved, no longer stocked");
    expect(gone.message).toBeNull();
    expect((await renderEmail(fitCardEmail(gone))).text).not.toContain("A note from the shop");
  });
});
