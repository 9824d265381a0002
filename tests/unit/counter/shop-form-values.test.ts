import { describe, expect, it } from "vitest";
import { checkShopForm, formFieldOf, formValuesOf } from "@/components/counter/shop-form-values";
import type { ShopSettings } from "@/lib/shop/settings-schema";

const saved: ShopSettings = {
  name: "Marrowby Tire Works",
  address: { streetAddress: "410 Foundry Street", town: "Halvering", region: "OH", postalCode: "43999" },
  phone: "(555) 014-2290",
  email: "counter@marrowby-tire.test",
  timeZone: "America/New_York",
  hours: { mon: [["07:30", "18:00"]], tue: [["07:30", "18:00"]], wed: [["07:30", "18:00"]], thu: [["07:30", "18:00"]], fri: [["07:30", "18:00"]], sat: [["08:00", "14:00"]], sun: [] },
  closedDates: ["2026-12-25"],
  tolerancePct: 3,
  fittingPerTireCents: 2_500,
  disposalPerTireCents: 400,
  tireFeePerTireCents: 100,
  taxRateBp: 725,
  taxServices: true,
  fittingBays: 2,
  fittingMinutes: 60,
  leadMinutes: 120,
  cancelCutoffHours: 24,
  wearLimit32: 2,
};

describe("the shop settings form", () => {
  it("shows charges in dollars and the tax rate in percent", () => {
    expect(formValuesOf(saved)).toMatchObject({ fittingPerTire: "25.00", disposalPerTire: "4.00", tireFeePerTire: "1.00", taxPercent: "7.25", tolerancePct: "3", town: "Halvering" });
  });

  it("sends only what changed: dollars as cents, the percent as basis points, one part of the address, one day", () => {
    const values = { ...formValuesOf(saved), fittingPerTire: "$27.50", taxPercent: "8", town: " Upper Halvering ", hours: { ...saved.hours, sat: [["08:00", "12:00"], ["13:00", "16:00"]] as [string, string][] } };
    const checked = checkShopForm(values, saved);
    expect(checked).toMatchObject({
      ok: true,
      body: { address: { town: "Upper Halvering" }, hours: { sat: [["08:00", "12:00"], ["13:00", "16:00"]] }, fittingPerTireCents: 2_750, taxRateBp: 800 },
    });
    expect(checked.ok && checked.changes.map((change) => change.words)).toEqual([
      "town “Halvering” → “Upper Halvering”",
      "Saturday 08:00–14:00 → 08:00–12:00, 13:00–16:00",
      "fitting $25.00 → $27.50 per tire",
      "tax rate 7.25 % → 8 %",
    ]);
    expect(checkShopForm(formValuesOf(saved), saved)).toEqual({ ok: true, body: null, changes: [] });
  });

  it("marks each field it cannot read, by the API's field names", () => {
    const values = { ...formValuesOf(saved), name: " ", taxPercent: "7.255", fittingPerTire: "lots", tolerancePct: "6", hours: { ...saved.hours, sat: [["13:00", "16:00"], ["08:00", "12:00"]] as [string, string][] } };
    const checked = checkShopForm(values, saved);
    expect(checked.ok).toBe(false);
    expect(Object.keys(checked.ok ? {} : checked.errors).sort()).toEqual(["fittingPerTireCents", "hours.sat", "name", "taxRateBp", "tolerancePct"]);
  });

  it("holds the fitting settings as typed and sends only those that changed, as whole numbers", () => {
    expect(formValuesOf(saved)).toMatchObject({ fittingBays: "2", fittingMinutes: "60", leadMinutes: "120", cancelCutoffHours: "24" });
    const checked = checkShopForm({ ...formValuesOf(saved), fittingBays: " 3 ", cancelCutoffHours: "0" }, saved);
    expect(checked).toMatchObject({ ok: true, body: { fittingBays: 3, cancelCutoffHours: 0 } });
    expect(checked.ok && Object.keys(checked.body ?? {}).sort()).toEqual(["cancelCutoffHours", "fittingBays"]);
    expect(checked.ok && checked.changes.map((change) => change.words)).toEqual(["fitting bays 2 → 3", "online cancelling until 24 → 0 hours before"]);
  });

  it("refuses fitting settings outside the limits the database keeps, or not whole numbers", () => {
    const values = { ...formValuesOf(saved), fittingBays: "0", fittingMinutes: "10", leadMinutes: "1.5", cancelCutoffHours: "169" };
    const checked = checkShopForm(values, saved);
    expect(checked.ok ? {} : checked.errors).toMatchObject({
      fittingBays: "Enter the number of bays, a whole number from 1 to 20.",
      fittingMinutes: "Enter the minutes one set takes, a whole number from 15 to 480.",
      leadMinutes: "Enter the minutes ahead, a whole number from 0 to 20160.",
      cancelCutoffHours: "Enter the hours before a fitting, a whole number from 0 to 168.",
    });
    expect(checkShopForm({ ...formValuesOf(saved), fittingBays: "20", fittingMinutes: "480", leadMinutes: "20160", cancelCutoffHours: "168" }, saved).ok).toBe(true);
  });

  it("places the API's refusals beside the field they name", () => {
    expect([formFieldOf("hours.sat.1.0"), formFieldOf("address.town"), formFieldOf("closedDates.2"), formFieldOf("body"), formFieldOf(null)]).toEqual(["hours.sat", "address.town", "closedDates", "form", "form"]);
  });
});
