import { sql } from "drizzle-orm";
import { z } from "zod";
import type { DatabaseHandle, DatabaseKind } from "@/db/client";
import { schemaOf } from "@/lib/api/schema-match";

/** GET /api/health's 200 body. */
export const healthyBodySchema = z.object({ status: z.literal("ok"), db: schemaOf<DatabaseKind>()(z.enum(["pglite", "postgres"])) });

/** Its 503 body. */
export const unhealthyBodySchema = z.object({
  status: z.literal("error"),
  error: z.object({ code: z.literal("database_unavailable"), message: z.string() }),
});

export type HealthReport = { ok: true; body: z.infer<typeof healthyBodySchema> } | { ok: false; body: z.infer<typeof unhealthyBodySchema> };

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
