import { shopSettingsChangesSchema, shopSettingsSchema } from "@/lib/shop/settings-schema";
import { named, type ApiOperation } from "./operation";

const settings = named("ShopSettings", shopSettingsSchema);

/** The shop's own settings: read by anyone, changed by admins. */
export const SHOP_ROUTES: ApiOperation[] = [
  {
    method: "get",
    path: "/api/v1/shop",
    tag: "Shop",
    summary: "The shop's contact, time zone, opening hours, closed dates, default tolerance and charges",
    description: "Charges are whole cents per tire; `taxRateBp` is in basis points (725 = 7.25 %); the tire fee is never taxed. 404 before the shop has been set up.",
    access: "public",
    answers: [{ status: 200, description: "The shop's settings.", json: settings }],
    errors: ["not_found"],
  },
  {
    method: "patch",
    path: "/api/v1/shop",
    tag: "Shop",
    summary: "Change any of the shop's settings",
    description:
      "Name only what changes: a setting left out stays as it is, and so do the parts of `address` and the days of `hours` left out. " +
      "`timeZone` is an IANA name (America/New_York, UTC); each day's intervals are HH:MM from 00:00 to 24:00, in order, apart; " +
      "`closedDates` replaces the list (real YYYY-MM-DD dates, each once, kept in order). An unknown field answers 400 naming it. " +
      "The change and its audit entry are written together.",
    access: "admin",
    body: named("ShopSettingsChanges", shopSettingsChangesSchema),
    answers: [{ status: 200, description: "All the settings after the change.", json: settings }],
    errors: ["not_found"],
  },
];
