import type { Database } from "@/db/client";

// Shapes in use stay few (which filters a search sets, the sort, a cursor or not); this only bounds a pathological mix.
const MAX_STATEMENTS_PER_DATABASE = 200;

const cacheByDatabase = new WeakMap<Database, Map<string, unknown>>();
let statementsPrepared = 0;

/**
 * The prepared statement for `key`, built by `build` the first time and reused after: building the
 * finder's SQL costs more than running it. Names are never reused, since a server keeps a prepared
 * statement per connection for as long as the connection lives.
 */
export function cachedStatement<Prepared>(db: Database, key: string, build: () => { prepare: (name: string) => Prepared }): Prepared {
  let cache = cacheByDatabase.get(db);
  if (!cache) {
    cache = new Map();
    cacheByDatabase.set(db, cache);
  }
  const cached = cache.get(key);
  if (cached !== undefined) return cached as Prepared;
  if (cache.size >= MAX_STATEMENTS_PER_DATABASE) cache.clear();
  statementsPrepared += 1;
  const statement = build().prepare(`catalog_finder_${statementsPrepared}`);
  cache.set(key, statement);
  return statement;
}
