import { NextResponse } from "next/server";
import { withRoute } from "@/lib/auth/guard";
import { acceptOffer } from "@/lib/offers/accept-offer";
import { refusalAnswer } from "@/lib/offers/answers";
import { sendFittingBookedEmails } from "@/lib/offers/offer-emails";
import { acceptOfferSchema, offerTokenParamsSchema } from "@/lib/offers/offer-input";

/**
 * The driver accepts with one of the free starts → 200 { status: "accepted", appointment }; the
 * tires are held and the bay taken. Expired, withdrawn or cancelled → 410; already accepted, the time
 * taken or the tires gone → 409 with the next free times.
 */
export const POST = withRoute({ role: "public", params: offerTokenParamsSchema, body: acceptOfferSchema }, async ({ db, params, body }) => {
  const accepted = await acceptOffer(db, params.token, body.slotStart);
  if (!accepted.ok) return refusalAnswer(accepted);
  await sendFittingBookedEmails(db, accepted.offerId);
  return NextResponse.json({ status: "accepted", appointment: accepted.appointment });
});
