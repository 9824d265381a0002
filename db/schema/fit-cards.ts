import { sql } from "drizzle-orm";
import { boolean, check, doublePrecision, index, integer, jsonb, pgTable, primaryKey, serial, smallint, text, timestamp } from "drizzle-orm/pg-core";
import { SEASONS } from "../../lib/tire/vocabulary";
import { user } from "./auth";
import { stockItem } from "./catalog";

/**
 * A saved comparison with its own link (`/s/{slug}`): the sizes compared, everything the judge of
 * equal-or-better reads about the original (service description, load range, run-flat, the Placard
 * check's minimums, its season), the tolerance and a note. The slug is random, never derived from the content.
 */
export const fitCard = pgTable(
  "fit_card",
  {
    id: serial().primaryKey(),
    slug: text().notNull().unique(),
    authorId: text().references(() => user.id, { onDelete: "set null" }),
    /** Normalized designations, the reference first. */
    sizes: jsonb().$type<string[]>().notNull(),
    loadIndex: smallint().notNull(),
    loadIndexDual: smallint(),
    speedSymbol: text().notNull(),
    loadRange: text(),
    runFlat: boolean().notNull().default(false),
    /** The Placard check's minimums when the card was saved from it. */
    minLoadIndex: smallint(),
    minLoadIndexDual: smallint(),
    originalSeason: text({ enum: SEASONS }),
    tolerancePct: doublePrecision().notNull(),
    note: text(),
    /** The depths left on the tires that stay on an all-wheel-drive vehicle (32nds), when the card was saved with them. */
    wearRemaining32: jsonb().$type<number[]>(),
    /** The limit between the tread depths of any two tires on that vehicle (32nds). */
    wearLimit32: doublePrecision(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp({ withTimezone: true }),
    revokedAt: timestamp({ withTimezone: true }),
  },
  (table) => [
    index("fit_card_author").on(table.authorId),
    check("fit_card_tolerance", sql`${table.tolerancePct} between 1 and 5`),
    check("fit_card_load_index", sql`${table.loadIndex} between 0 and 279`),
    check(
      "fit_card_other_load_indices",
      sql`coalesce(${table.loadIndexDual}, 0) between 0 and 279 and coalesce(${table.minLoadIndex}, 0) between 0 and 279 and coalesce(${table.minLoadIndexDual}, 0) between 0 and 279`,
    ),
    check("fit_card_original_season", sql`${table.originalSeason} in ${sql.raw(`(${SEASONS.map((season) => `'${season}'`).join(", ")})`)}`),
    check("fit_card_note", sql`length(${table.note}) <= 1000`),
    check(
      "fit_card_wear",
      sql`(${table.wearRemaining32} is null) = (${table.wearLimit32} is null) and (${table.wearLimit32} is null or ${table.wearLimit32} between 0.5 and 8)`,
    ),
  ],
);

/** A catalog tire chosen for a card, with its price when the card was saved. */
export const fitCardTire = pgTable(
  "fit_card_tire",
  {
    cardId: integer()
      .notNull()
      .references(() => fitCard.id, { onDelete: "cascade" }),
    position: smallint().notNull(),
    stockItemId: integer()
      .notNull()
      .references(() => stockItem.id, { onDelete: "restrict" }),
    priceCentsAtSave: integer().notNull(),
  },
  (table) => [primaryKey({ columns: [table.cardId, table.position] }), check("fit_card_tire_price", sql`${table.priceCentsAtSave} >= 0`)],
);

export type FitCard = typeof fitCard.$inferSelect;
