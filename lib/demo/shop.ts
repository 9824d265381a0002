import type { NewShop } from "@/db/schema";

/** An invented shop in an invented town; the 555-01xx number is reserved for fiction. */
export const demoShop: NewShop = {
  name: "Marrowby Tire Works",
  streetAddress: "410 Foundry Street",
  town: "Halvering",
  region: "OH",
  postalCode: "43999",
  phone: "(555) 014-2290",
  email: "counter@marrowby-tire.test",
  openingHours: "Mon–Fri 7:30–18:00, Sat 8:00–14:00",
  defaultTolerancePct: 3,
};
