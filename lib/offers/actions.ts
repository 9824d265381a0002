"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { withAction } from "@/lib/auth/action";
import { requestIdSchema } from "@/lib/quotes/queries";
import { FITTING_OUTCOMES } from "@/lib/tire";
import { skuSchema } from "@/lib/validation/sku";
import { createOffer } from "./create-offer";
import { fittingOutcomeWords } from "./labels";
import { sendFittingCancelledEmails, sendOfferEmail } from "./offer-emails";
import { newOfferSchema, offerIdParamsSchema } from "./offer-input";
import { readOfferTire, type OfferTire } from "./offer-tire";
import { markFitting as markStoredFitting, withdrawOffer as withdrawStoredOffer } from "./staff-offers";

const sendOfferSchema = newOfferSchema.extend({ requestId: requestIdSchema });
const markFittingSchema = offerIdParamsSchema.extend({
  requestId: requestIdSchema,
  outcome: z.enum(FITTING_OUTCOMES, { error: "choose fitted, no-show or cancelled" }),
});
const offerChangeSchema = offerIdParamsSchema.extend({ requestId: requestIdSchema });

function refreshOffers(requestId: number) {
  revalidatePath("/counter/requests");
  revalidatePath(`/counter/requests/${requestId}`);
  revalidatePath("/counter/fittings");
}

/** Counter: a catalog tire to add to an offer, by SKU: today's price and how many can be sold now. */
export const findOfferTire = withAction({ role: "staff", input: z.object({ sku: skuSchema }) }, async ({ db, input }) => {
  const tire = await readOfferTire(db, input.sku);
  if (!tire) return { ok: false, status: 404, message: `The catalog sells no current item with the SKU “${input.sku}”: check it in the Catalog tab.` };
  return { ok: true, data: tire satisfies OfferTire };
});

/** Counter: a priced offer for a request, its estimate frozen now; the page then shows its link. */
export const sendOffer = withAction({ role: "staff", input: sendOfferSchema }, async ({ db, user, input }) => {
  const { requestId, ...offer } = input;
  const created = await createOffer(db, user, requestId, offer);
  if (!created.ok) {
    if (created.code === "not_found") return { ok: false, status: 404, message: created.message };
    return { ok: false, status: 400, message: created.message, fieldErrors: { [created.field ?? "form"]: created.message } };
  }
  const emailed = (await sendOfferEmail(db, created.offer.id)).ok;
  refreshOffers(requestId);
  const { id, url } = created.offer;
  return {
    ok: true,
    data: { id, url, emailed },
    message: emailed ? `Offer #${id} sent: the driver has it by e-mail.` : `Offer #${id} saved, but not e-mailed: give the driver its link.`,
  };
});

/** Counter: withdraws an offer the driver has not accepted. */
export const withdrawOffer = withAction({ role: "staff", input: offerChangeSchema }, async ({ db, user, input }) => {
  const changed = await withdrawStoredOffer(db, user, input.id);
  if (!changed.ok) return changed;
  refreshOffers(input.requestId);
  return { ok: true, data: undefined, message: `Offer #${input.id} withdrawn: its link now says so.` };
});

/** Counter: marks a booked fitting fitted (the tires are sold), a no-show or cancelled (they go back on sale). */
export const markFitting = withAction({ role: "staff", input: markFittingSchema }, async ({ db, user, input }) => {
  const changed = await markStoredFitting(db, user, input.id, input.outcome);
  if (!changed.ok) return changed;
  if (input.outcome === "cancelled") await sendFittingCancelledEmails(db, input.id);
  refreshOffers(input.requestId);
  return { ok: true, data: undefined, message: `Fitting of offer #${input.id} marked ${fittingOutcomeWords[input.outcome].label.toLowerCase()}.` };
});
