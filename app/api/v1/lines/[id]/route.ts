import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { lineChangesSchema, lineParamsSchema } from "@/lib/brands/brand-bodies";
import { updateLine } from "@/lib/brands/line-writes";

/** Staff change a line, or retire or un-retire it → 200; unknown id → 404; a name its brand already has → 409. */
export const PATCH = withRoute({ role: "staff", params: lineParamsSchema, body: lineChangesSchema }, async ({ db, user, params, body }) => {
  const result = await updateLine(db, params.id, body, user);
  return result.ok ? NextResponse.json(result.value) : apiError(result.code, result.message, undefined, result.field);
});
