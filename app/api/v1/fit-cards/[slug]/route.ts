import { connection, NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db/client";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { fitCardParamsSchema } from "@/lib/fit-cards/card-input";
import { readFitCard } from "@/lib/fit-cards/read-card";
import { revokeFitCard } from "@/lib/fit-cards/revoke-card";

const missing = () => apiError("not_found", "No Fit card has this address: check the link.");

/** Public: the card, 410 once withdrawn or expired. */
export async function GET(_request: NextRequest, { params }: { params: Promise<{ slug: string }> }) {
  await connection();
  const parsed = fitCardParamsSchema.safeParse(await params);
  if (!parsed.success) return missing();
  const lookup = await readFitCard(await getDb(), parsed.data.slug);
  if (lookup.status === "missing") return missing();
  if (lookup.status === "withdrawn") {
    return apiError("gone", lookup.why === "revoked" ? "This Fit card was withdrawn by the shop or its author." : "This Fit card has expired.");
  }
  return NextResponse.json(lookup.card, { headers: { "Cache-Control": "private, no-store" } });
}

/** The author or staff withdraw a card → 204. */
export const DELETE = withRoute({ role: "customer", params: fitCardParamsSchema }, async ({ db, user, params }) => {
  const result = await revokeFitCard(db, user, params.slug);
  if (result === "not_found") return missing();
  if (result === "forbidden") return apiError("forbidden", "Only the card's author or shop staff can withdraw it.");
  return new Response(null, { status: 204 });
});
