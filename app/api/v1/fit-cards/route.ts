import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { siteUrl } from "@/lib/env/site-url";
import { newFitCardSchema, type SavedFitCard } from "@/lib/fit-cards/card-input";
import { SAVE_FIT_CARD_ROLE } from "@/lib/tire";
import { createFitCard } from "@/lib/fit-cards/create-card";

/** Anyone signed in saves a comparison as a Fit card → 201 { slug, url }. */
export const POST = withRoute({ role: SAVE_FIT_CARD_ROLE, body: newFitCardSchema }, async ({ db, user, body }) => {
  const result = await createFitCard(db, user.id, body);
  if (!result.ok) return apiError(result.code, result.message);
  const url = new URL(`/s/${result.slug}`, siteUrl()).toString();
  const saved: SavedFitCard = { slug: result.slug, url };
  return NextResponse.json(saved, { status: 201, headers: { Location: url } });
});
