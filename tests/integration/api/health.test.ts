import { NextRequest } from "next/server";
import { describe, expect, it, vi } from "vitest";
import { GET } from "@/app/api/health/route";
import { openDatabase } from "@/db/client";
import { getDatabaseHandle } from "@/lib/database/app-database";
import { checkDatabase } from "@/lib/health/check-database";
import { checkContract } from "../helpers/contract";
import { openTestDatabase, testDatabaseKinds } from "../helpers/test-database";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

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

describe("GET /api/health", () => {
  it("answers 200 once the app's own database answers a query", async () => {
    vi.stubEnv("DATABASE_URL", "");
    vi.stubEnv("PGLITE_DATA_DIR", "memory://");
    vi.stubEnv("DEMO_SEED", "off");
    try {
      const response = await checkContract(new NextRequest("http://localhost:3000/api/health"), await GET());
      expect(await response.json()).toEqual({ status: "ok", db: "pglite" });
    } finally {
      await (await getDatabaseHandle()).close();
      vi.unstubAllEnvs();
    }
  });
});
