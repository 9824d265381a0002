import type { BookedOfferFacts } from "@/lib/offers/offer-facts";

/**
 * An accepted offer of the invented demo shop: four tires at $182.99 with the demo charges
 * (73,196 + 10,000 + 2,000 + 6,148 tax = 91,344, worked in tests/unit/money/estimate.test.ts),
 * fitted at 09:00 in New York on 2026-12-05 (-05:00, so 14:00 UTC).
 */
export const bookedFacts: BookedOfferFacts = {
  offerId: 42,
  requestId: 7,
  status: "accepted",
  senderId: "u-staff",
  driver: { name: "Rosa Iverley", email: "rosa@example.test", phone: "+1 555 014 2233", vehicle: "2019 family SUV" },
  lines: [{ label: "Testwell Fixture touring 225/65R17 102H", quantity: 4, priceCents: 18_299 }],
  estimate: { quantity: 4, tiresCents: 73_196, servicesCents: 10_000, feesCents: 2_000, taxCents: 6_148, totalCents: 91_344 },
  validUntilDate: "2026-12-03",
  message: "We have these on the rack.\nAsk for Ollie.",
  fitting: { bay: 2, start: new Date("2026-12-05T14:00:00Z"), end: new Date("2026-12-05T15:00:00Z"), calendarSequence: 0 },
  shop: {
    name: "Marrowby Tire Works",
    streetAddress: "410 Foundry Street",
    town: "Halvering",
    region: "OH",
    postalCode: "43999",
    phone: "(555) 014-2290",
    email: "counter@marrowby-tire.test",
    openingHours: "Mon–Fri 7:30 AM–6:00 PM",
  },
  timeZone: "America/New_York",
  cancelCutoffHours: 24,
  offerUrl: "https://sidewise.example.test/o/Tok3n_abcdefghijklmnopqr",
  counterUrl: "https://sidewise.example.test/counter/requests/7",
  host: "sidewise.example.test",
};
