import { PGlite } from "@electric-sql/pglite";
import { fillPlaceholders } from "drizzle-orm";
import type { Database } from "@/db/client";
import { firstValueOfNamedStatement } from "./pglite-named-statement";

/** A statement of one row whose column "answer" holds the whole answer as JSON. */
interface AnswerStatement {
  toSQL: () => { sql: string; params: unknown[] };
  prepare: (name: string) => { execute: (values: Record<string, unknown>) => Promise<{ answer: unknown }[]> };
}

/** Runs a cached statement with the values of its placeholders and answers its JSON value. */
export type StatementRunner = (values: Record<string, unknown>) => Promise<unknown>;

// Shapes in use stay few (which filters a search sets, the sort, a cursor or not); this only bounds a pathological mix.
const MAX_STATEMENTS_PER_DATABASE = 200;

const cacheByDatabase = new WeakMap<Database, Map<string, StatementRunner>>();
let statementsPrepared = 0;

function prepare(db: Database, statement: AnswerStatement): StatementRunner {
  const client = (db as { $client?: unknown }).$client;
  if (client instanceof PGlite) {
    const { sql: text, params } = statement.toSQL();
    return async (values) => {
      const json = await firstValueOfNamedStatement(client, text, fillPlaceholders(params, values));
      return json === null ? null : JSON.parse(json);
    };
  }
  // A server keeps a prepared statement per connection for as long as it lives: names are never reused.
  statementsPrepared += 1;
  const prepared = statement.prepare(`catalog_finder_${statementsPrepared}`);
  return async (values) => (await prepared.execute(values))[0]?.answer;
}

/**
 * The statement for `key`, built by `build` the first time and prepared, then reused: building and
 * planning the finder's SQL costs more than running it.
 */
export function cachedStatement(db: Database, key: string, build: () => AnswerStatement): StatementRunner {
  let cache = cacheByDatabase.get(db);
  if (!cache) {
    cache = new Map();
    cacheByDatabase.set(db, cache);
  }
  const cached = cache.get(key);
  if (cached) return cached;
  if (cache.size >= MAX_STATEMENTS_PER_DATABASE) cache.clear();
  const runner = prepare(db, build());
  cache.set(key, runner);
  return runner;
}
