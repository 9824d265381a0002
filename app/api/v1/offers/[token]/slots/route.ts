import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { offerTokenParamsSchema, slotsQuerySchema } from "@/lib/offers/offer-input";
import { readOfferSlots } from "@/lib/offers/offer-slots";

/** The free fitting times for an offer's driver, 14 days from `from` (default today in the shop's zone) → 200; an unknown token → 404. */
export const GET = withRoute({ role: "public", params: offerTokenParamsSchema, query: slotsQuerySchema }, async ({ db, params, query }) => {
  const slots = await readOfferSlots(db, params.token, { from: query.from });
  return slots ? NextResponse.json(slots, { headers: { "Cache-Control": "private, no-store" } }) : apiError("not_found", "There is no offer at this link: check the address in the e-mail, or ask the shop.");
});
