import { acceptedSchema, cancelledSchema, sentOfferSchema } from "@/lib/offers/answers";
import { acceptOfferSchema, newOfferSchema, offerTokenParamsSchema, requestIdParamsSchema, slotsQuerySchema } from "@/lib/offers/offer-input";
import { slotListSchema } from "@/lib/offers/offer-slots";
import { publicOfferSchema } from "@/lib/offers/public-offer";
import { named, type ApiOperation } from "./operation";

const TAG = "Offers and fittings";

/** Priced offers: sent by staff, read, accepted and cancelled by the driver through the offer's token. */
export const OFFER_ROUTES: ApiOperation[] = [
  {
    method: "post",
    path: "/api/v1/quote-requests/{id}/offers",
    tag: TAG,
    summary: "Send a priced offer for a request",
    description:
      "One package: every line is bought together (to offer alternatives, send two offers). Priced now with the shop's charges and frozen; valid until the end of " +
      "validUntil in the shop's time zone (default 7 days). The request becomes offered and the driver is e-mailed the link. An unknown SKU or a past date → 422.",
    access: "staff",
    params: requestIdParamsSchema,
    body: named("NewOffer", newOfferSchema),
    answers: [{ status: 201, description: "Sent.", json: named("SentOffer", sentOfferSchema) }],
    errors: ["not_found", "unreadable"],
  },
  {
    method: "get",
    path: "/api/v1/offers/{token}",
    tag: TAG,
    summary: "An offer, by its token",
    access: "public",
    params: offerTokenParamsSchema,
    answers: [{ status: 200, description: "The offer.", json: named("Offer", publicOfferSchema) }],
    errors: ["not_found"],
  },
  {
    method: "get",
    path: "/api/v1/offers/{token}/slots",
    tag: TAG,
    summary: "Free fitting times, 14 days from a date",
    description: "From the shop's opening hours and closed dates, its bays, the minutes a fitting takes and its lead time, in the shop's time zone.",
    access: "public",
    params: offerTokenParamsSchema,
    query: slotsQuerySchema,
    answers: [{ status: 200, description: "The free times.", json: named("FittingSlots", slotListSchema) }],
    errors: ["not_found"],
  },
  {
    method: "post",
    path: "/api/v1/offers/{token}/accept",
    tag: TAG,
    summary: "Accept an offer with a fitting time",
    description:
      "slotStart is one of the free starts (the same instant in another offset counts). The tires are held until the end of the fitting's day or until staff " +
      "release them. Expired, withdrawn or cancelled → 410; already accepted → 409 already_accepted; the time no longer free → 409 slot_taken; the tires no " +
      "longer there → 409 not_enough_stock; the last two with nextSlots.",
    access: "public",
    params: offerTokenParamsSchema,
    body: named("AcceptOffer", acceptOfferSchema),
    answers: [{ status: 200, description: "Booked and held; confirmations with a calendar entry are e-mailed.", json: named("OfferAccepted", acceptedSchema) }],
    errors: ["not_found", "gone", "already_accepted", "slot_taken", "not_enough_stock"],
  },
  {
    method: "post",
    path: "/api/v1/offers/{token}/cancel",
    tag: TAG,
    summary: "Cancel a booked fitting",
    description: "Up to the shop's cut-off before the start; the hold is released and a calendar cancellation e-mailed. Later → 409 too_late; nothing booked → 409 not_booked.",
    access: "public",
    params: offerTokenParamsSchema,
    answers: [{ status: 200, description: "Cancelled.", json: named("OfferCancelled", cancelledSchema) }],
    errors: ["not_found", "gone", "too_late", "not_booked"],
  },
];
