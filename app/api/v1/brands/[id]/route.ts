import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { brandChangesSchema, brandParamsSchema } from "@/lib/brands/brand-bodies";
import { renameBrand } from "@/lib/brands/brand-writes";

/** Staff rename a brand → 200; unknown id → 404; a name another brand has → 409. */
export const PATCH = withRoute({ role: "staff", params: brandParamsSchema, body: brandChangesSchema }, async ({ db, user, params, body }) => {
  const result = await renameBrand(db, params.id, body, user);
  return result.ok ? NextResponse.json(result.value) : apiError(result.code, result.message, undefined, result.field);
});
