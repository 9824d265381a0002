import { sql } from "drizzle-orm";
import type { DatabaseHandle, DatabaseKind } from "@/db/client";

export type HealthReport =
  | { ok: true; body: { status: "ok"; db: DatabaseKind } }
  | { ok: false; body: { status: "error"; error: { code: "database_unavailable"; message: string } } };

/** Healthy only once a real query has come back from the database. */
export async function checkDatabase(open: () => Promise<DatabaseHandle>): Promise<HealthReport> {
  try {
    const { db, kind } = await open();
    await db.execute(sql`select 1`);
    return { ok: true, body: { status: "ok", db: kind } };
  } catch (error) {
    console.error("health check failed", error);
    return {
      ok: false,
      body: { status: "error", error: { code: "database_unavailable", message: "The database could not be reached." } },
    };
  }
}
