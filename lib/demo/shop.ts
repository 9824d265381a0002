import type { NewShop } from "@/db/schema";
import type { ShopCharges } from "@/lib/money/estimate";

/** Invented charges: fitting and balancing, disposal of the old tire, a state tire fee, sales tax on tires and services. */
export const demoShopCharges: ShopCharges = {
  fittingPerTireCents: 2_500,
  disposalPerTireCents: 400,
  tireFeePerTireCents: 100,
  taxRateBp: 725,
  taxServices: true,
};

/** An invented shop in an invented town; the 555-01xx number is reserved for fiction. */
export const demoShop: NewShop = {
  name: "Marrowby Tire Works",
  streetAddress: "410 Foundry Street",
  town: "Halvering",
  region: "OH",
  postalCode: "43999",
  phone: "(555) 014-2290",
  email: "counter@marrowby-tire.test",
  timeZone: "America/New_York",
  hours: {
    mon: [["07:30", "18:00"]],
    tue: [["07:30", "18:00"]],
    wed: [["07:30", "18:00"]],
    thu: [["07:30", "18:00"]],
    fri: [["07:30", "18:00"]],
    sat: [["08:00", "14:00"]],
    sun: [],
  },
  closedDates: ["2026-12-25", "2027-01-01"],
  defaultTolerancePct: 3,
  ...demoShopCharges,
};
