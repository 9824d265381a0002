import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { offerTokenParamsSchema } from "@/lib/offers/offer-input";
import { readPublicOffer } from "@/lib/offers/public-offer";

/** Anyone with the link reads the offer → 200; an unknown token → 404. No staff names, no internal notes. */
export const GET = withRoute({ role: "public", params: offerTokenParamsSchema }, async ({ db, params }) => {
  const offer = await readPublicOffer(db, params.token);
  return offer ? NextResponse.json(offer, { headers: { "Cache-Control": "private, no-store" } }) : apiError("not_found", "There is no offer at this link: check the address in the e-mail, or ask the shop.");
});
