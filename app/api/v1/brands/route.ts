import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { newBrandSchema } from "@/lib/brands/brand-bodies";
import { createBrand } from "@/lib/brands/brand-writes";
import { listBrands } from "@/lib/brands/queries";

/** Public: every brand with its lines, retired ones included, in name order. */
export const GET = withRoute({ role: "public" }, async ({ db }) => NextResponse.json(await listBrands(db)));

/** Staff add a brand → 201; a name already taken, in any letter case → 409. */
export const POST = withRoute({ role: "staff", body: newBrandSchema }, async ({ db, user, body }) => {
  const result = await createBrand(db, body, user);
  return result.ok ? NextResponse.json(result.value, { status: 201 }) : apiError(result.code, result.message, undefined, result.field);
});
