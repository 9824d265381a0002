import { integer, pgTable, primaryKey, text, timestamp } from "drizzle-orm/pg-core";

/** Requests counted per key ("quote:ip:…", "email:user:…") in fixed windows; old windows are pruned. */
export const rateLimitHit = pgTable(
  "rate_limit_hit",
  {
    key: text().notNull(),
    windowStart: timestamp({ withTimezone: true }).notNull(),
    hits: integer().notNull(),
  },
  (table) => [primaryKey({ columns: [table.key, table.windowStart] })],
);
