import { describe, expect, it, vi } from "vitest";
import { openDatabase } from "@/db/client";
import { checkDatabase } from "@/lib/health/check-database";
import { openTestDatabase, testDatabaseKinds } from "../helpers/test-database";

describe("database health", () => {
  it.each(testDatabaseKinds)("reports ok and the kind of database on %s", async (kind) => {
    const database = await openTestDatabase(kind);
    try {
      expect(await checkDatabase(async () => database)).toEqual({ ok: true, body: { status: "ok", db: kind } });
    } finally {
      await database.close();
    }
  });

  it("reports an error when the server cannot be reached", async () => {
    vi.spyOn(console, "error").mockImplementation(() => undefined);
    const unreachable = await openDatabase({ url: "postgres://nobody@127.0.0.1:1/none" });
    const report = await checkDatabase(async () => unreachable);
    await unreachable.close();
    expect(report.ok).toBe(false);
    expect(report.body).toMatchObject({ status: "error", error: { code: "database_unavailable" } });
  });
});
