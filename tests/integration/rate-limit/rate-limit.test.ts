import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { hitRateLimit } from "@/lib/rate-limit/rate-limit";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

describe.each(testDatabaseKinds)("rate limits on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  afterAll(async () => {
    await database?.close();
  });

  it("allows `limit` hits a window per key, then says how long to wait", async () => {
    const rule = { limit: 3, windowSeconds: 60 };
    const at = new Date("2026-12-02T10:00:10Z");
    const verdicts = [];
    for (let i = 0; i < 4; i++) verdicts.push(await hitRateLimit(database.db, "test:a", rule, at));
    expect(verdicts.map((verdict) => verdict.allowed)).toEqual([true, true, true, false]);
    expect(verdicts[3]).toEqual({ allowed: false, retryAfterSeconds: 50 });
    expect((await hitRateLimit(database.db, "test:b", rule, at)).allowed).toBe(true);
    expect((await hitRateLimit(database.db, "test:a", rule, new Date("2026-12-02T10:01:00Z"))).allowed).toBe(true);
  });
});
