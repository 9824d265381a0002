import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { PGlite } from "@electric-sql/pglite";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { firstValueOfNamedStatement } from "@/lib/alternatives/pglite-named-statement";

/*
 * The finder runs its statement under a name on PGlite (2.6× faster at the median than query(), which
 * re-plans every call: 1.9 ms against 5.3 ms over 50,000 items, measured with both interleaved). That
 * path uses PGlite's protocol exports and its private _runExclusiveTransaction. These checks fail
 * loudly when an upgrade changes either, before a search could go wrong.
 */
const VERSION_MEASURED = "0.5.16";

function installedVersion(): string {
  const entry = createRequire(import.meta.url).resolve("@electric-sql/pglite");
  let folder = path.dirname(entry);
  while (!folder.endsWith(path.join("node_modules", "@electric-sql", "pglite"))) folder = path.dirname(folder);
  return (JSON.parse(readFileSync(path.join(folder, "package.json"), "utf8")) as { version: string }).version;
}

describe("the finder's named statements on PGlite", () => {
  let client: PGlite;
  beforeAll(async () => {
    client = new PGlite();
    await client.exec("create table item (id int primary key, name text, fits boolean); insert into item values (1, 'one', true), (2, null, false), (3, 'three', true)");
  });
  afterAll(async () => {
    await client.close();
  });

  it(`runs on the PGlite version it was measured on (${VERSION_MEASURED}): after an upgrade, check the private method it uses and measure again`, () => {
    expect(installedVersion()).toBe(VERSION_MEASURED);
    expect(typeof (client as unknown as { _runExclusiveTransaction?: unknown })._runExclusiveTransaction).toBe("function");
  });

  it("answers as query() does, with text, null and boolean parameters, on the first run and on reuse", async () => {
    const text = "select json_agg(id order by id)::text from item where ($1::text is null or name = $1) and fits = $2::boolean";
    for (const values of [[null, true], ["three", true], [null, false], ["none", true]] as const) {
      const expected = (await client.query<{ json_agg: string | null }>(text, [...values])).rows[0]?.json_agg ?? null;
      expect(await firstValueOfNamedStatement(client, text, values)).toBe(expected);
      expect(await firstValueOfNamedStatement(client, text, values)).toBe(expected);
    }
  });

  it("keeps one prepared statement per text, and never runs inside another caller's transaction", async () => {
    const before = (await client.query<{ count: number }>("select count(*)::int as count from pg_prepared_statements")).rows[0]?.count ?? 0;
    await firstValueOfNamedStatement(client, "select 41 + $1::int", [1]);
    await firstValueOfNamedStatement(client, "select 41 + $1::int", [2]);
    const after = (await client.query<{ count: number }>("select count(*)::int as count from pg_prepared_statements")).rows[0]?.count ?? 0;
    expect(after).toBe(before + 1);
    // A transaction that inserts, waits, then rolls back: a statement run meanwhile must wait for it and never see the row.
    let release = () => {};
    const gate = new Promise<void>((resolve) => (release = resolve));
    let inserted = () => {};
    const insertedRow = new Promise<void>((resolve) => (inserted = resolve));
    const rolledBack = client
      .transaction(async (tx) => {
        await tx.query("insert into item values (4, 'four', true)");
        inserted();
        await gate;
        throw new Error("roll back");
      })
      .catch((error: Error) => error.message);
    await insertedRow;
    const counted = firstValueOfNamedStatement(client, "select count(*)::text from item", []);
    release();
    expect(await rolledBack).toBe("roll back");
    expect(await counted).toBe("3");
  });
});
