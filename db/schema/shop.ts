import { sql } from "drizzle-orm";
import { boolean, check, doublePrecision, integer, jsonb, pgTable, serial, smallint, text, timestamp } from "drizzle-orm/pg-core";
import { DEFAULT_WEEKLY_HOURS, type WeeklyHours } from "../../lib/tire/vocabulary";

/**
 * The one shop this installation serves: its contact, its time zone and opening hours, the default
 * tolerance of the finder and the planner, and what a set costs beyond the tires (per tire, in cents;
 * the sales tax in basis points, 725 = 7.25 %).
 */
export const shop = pgTable(
  "shop",
  {
    id: serial().primaryKey(),
    name: text().notNull(),
    streetAddress: text().notNull(),
    town: text().notNull(),
    region: text().notNull(),
    postalCode: text().notNull(),
    phone: text().notNull(),
    email: text().notNull(),
    /** An IANA time zone name, e.g. America/New_York. */
    timeZone: text().notNull().default("America/New_York"),
    hours: jsonb().$type<WeeklyHours>().notNull().default(DEFAULT_WEEKLY_HOURS),
    /** Holidays, as YYYY-MM-DD in the shop's time zone. */
    closedDates: jsonb().$type<string[]>().notNull().default([]),
    defaultTolerancePct: doublePrecision().notNull().default(3),
    fittingPerTireCents: integer().notNull().default(0),
    disposalPerTireCents: integer().notNull().default(0),
    /** A per-new-tire fee some states charge; never taxed. */
    tireFeePerTireCents: integer().notNull().default(0),
    taxRateBp: integer().notNull().default(0),
    /** Whether fitting and disposal are taxed as well as the tires. */
    taxServices: boolean().notNull().default(false),
    /** How many sets can be fitted at once. */
    fittingBays: smallint().notNull().default(2),
    /** How long one set takes, also the step between fitting starts. */
    fittingMinutes: smallint().notNull().default(60),
    /** The earliest fitting start a driver can book, in minutes from now. */
    leadMinutes: integer().notNull().default(120),
    /** Until how many hours before the start a driver can cancel a fitting from the offer page. */
    cancelCutoffHours: smallint().notNull().default(24),
    /** Wear match's limit when a vehicle maker states none: 32nds of an inch of tread depth between any two tires. */
    wearLimit32: doublePrecision().notNull().default(2),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    check("shop_tolerance_range", sql`${table.defaultTolerancePct} between 1 and 5`),
    check("shop_charges", sql`${table.fittingPerTireCents} >= 0 and ${table.disposalPerTireCents} >= 0 and ${table.tireFeePerTireCents} >= 0`),
    check("shop_tax_rate", sql`${table.taxRateBp} between 0 and 10000`),
    check("shop_wear_limit", sql`${table.wearLimit32} between 0.5 and 8 and ${table.wearLimit32} * 2 = floor(${table.wearLimit32} * 2)`),
    check(
      "shop_fittings",
      sql`${table.fittingBays} between 1 and 20 and ${table.fittingMinutes} between 15 and 480 and ${table.leadMinutes} between 0 and 20160 and ${table.cancelCutoffHours} between 0 and 168`,
    ),
  ],
);

export type Shop = typeof shop.$inferSelect;
export type NewShop = typeof shop.$inferInsert;
