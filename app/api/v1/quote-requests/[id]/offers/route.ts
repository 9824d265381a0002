import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { createOffer } from "@/lib/offers/create-offer";
import { newOfferSchema, requestIdParamsSchema } from "@/lib/offers/offer-input";
import { sendOfferEmail } from "@/lib/offers/offer-emails";

/** Staff send a priced offer for a request → 201 { id, token, url, estimate, emailed }; an unknown request → 404; an unknown SKU or a past date → 422. */
export const POST = withRoute({ role: "staff", params: requestIdParamsSchema, body: newOfferSchema }, async ({ db, user, params, body }) => {
  const created = await createOffer(db, user, params.id, body);
  if (!created.ok) return apiError(created.code === "not_found" ? "not_found" : "unreadable", created.message, undefined, created.field);
  const emailed = (await sendOfferEmail(db, created.offer.id)).ok;
  return NextResponse.json({ ...created.offer, emailed }, { status: 201 });
});
