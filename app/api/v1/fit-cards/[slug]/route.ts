import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { fitCardParamsSchema } from "@/lib/fit-cards/card-input";
import { readFitCard } from "@/lib/fit-cards/read-card";
import { revokeFitCard } from "@/lib/fit-cards/revoke-card";

const missing = () => apiError("not_found", "No Fit card has this address: check the link.");

/** Public: the card, 410 once withdrawn or expired. */
export const GET = withRoute({ role: "public", params: fitCardParamsSchema }, async ({ db, params }) => {
  const lookup = await readFitCard(db, params.slug);
  if (lookup.status === "missing") return missing();
  if (lookup.status === "withdrawn") {
    return apiError("gone", lookup.why === "revoked" ? "This Fit card was withdrawn by the shop or its author." : "This Fit card has expired.");
  }
  return NextResponse.json(lookup.card, { headers: { "Cache-Control": "private, no-store" } });
});

/** The author or staff withdraw a card → 204. */
export const DELETE = withRoute({ role: "customer", params: fitCardParamsSchema }, async ({ db, user, params }) => {
  const result = await revokeFitCard(db, user, params.slug);
  if (result === "not_found") return missing();
  if (result === "forbidden") return apiError("forbidden", "Only the card's author or shop staff can withdraw it.");
  return new Response(null, { status: 204 });
});
