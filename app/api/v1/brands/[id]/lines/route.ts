import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { brandParamsSchema, newLineSchema } from "@/lib/brands/brand-bodies";
import { createLine } from "@/lib/brands/line-writes";

/** Staff add a line to a brand → 201; unknown brand → 404; a name the brand already has → 409. */
export const POST = withRoute({ role: "staff", params: brandParamsSchema, body: newLineSchema }, async ({ db, user, params, body }) => {
  const result = await createLine(db, params.id, body, user);
  return result.ok ? NextResponse.json(result.value, { status: 201 }) : apiError(result.code, result.message, undefined, result.field);
});
