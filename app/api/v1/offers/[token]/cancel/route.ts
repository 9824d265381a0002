import { NextResponse } from "next/server";
import { withRoute } from "@/lib/auth/guard";
import { refusalAnswer } from "@/lib/offers/answers";
import { cancelByDriver } from "@/lib/offers/cancel-offer";
import { sendFittingCancelledEmails } from "@/lib/offers/offer-emails";
import { offerTokenParamsSchema } from "@/lib/offers/offer-input";

/** The driver cancels a booked fitting up to the shop's cut-off → 200 { status: "cancelled" }; later → 409 too_late; nothing booked → 409 not_booked; gone → 410. */
export const POST = withRoute({ role: "public", params: offerTokenParamsSchema }, async ({ db, params }) => {
  const cancelled = await cancelByDriver(db, params.token);
  if (!cancelled.ok) return refusalAnswer(cancelled);
  await sendFittingCancelledEmails(db, cancelled.offerId);
  return NextResponse.json({ status: "cancelled" });
});
