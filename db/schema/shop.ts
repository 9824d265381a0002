import { sql } from "drizzle-orm";
import { check, doublePrecision, pgTable, serial, text, timestamp } from "drizzle-orm/pg-core";

/** The one shop this installation serves. Its default tolerance feeds the finder and the planner. */
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
    openingHours: text().notNull(),
    defaultTolerancePct: doublePrecision().notNull().default(3),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    check("shop_tolerance_range", sql`${table.defaultTolerancePct} between 1 and 5`),
  ],
);

export type Shop = typeof shop.$inferSelect;
export type NewShop = typeof shop.$inferInsert;
