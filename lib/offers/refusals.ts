import type { ApiErrorCode } from "@/lib/api/errors";
import type { FittingSlot } from "@/lib/fittings";

/** Why an offer cannot do what a driver or staff asked, as the API's code and plain words. */
export type OfferRefusalReason = "not_found" | "expired" | "withdrawn" | "cancelled" | "already_accepted" | "slot_taken" | "tires_gone" | "too_late" | "not_booked";

export interface OfferRefusal {
  ok: false;
  reason: OfferRefusalReason;
  code: ApiErrorCode;
  message: string;
  /** The next free times, when another time may do. */
  nextSlots?: FittingSlot[];
}

const REFUSALS: Record<OfferRefusalReason, { code: ApiErrorCode; message: string }> = {
  not_found: { code: "not_found", message: "There is no offer at this link: check the address in the e-mail, or ask the shop." },
  expired: { code: "gone", message: "This offer has expired: ask the shop for a new one (prices and stock may have changed)." },
  withdrawn: { code: "gone", message: "The shop has withdrawn this offer: ask the shop for a new one." },
  cancelled: { code: "gone", message: "This offer was cancelled: ask the shop for a new one." },
  already_accepted: { code: "already_accepted", message: "This offer has already been accepted: its fitting time is on the offer page." },
  slot_taken: { code: "slot_taken", message: "That fitting time is no longer free: choose another of the free times." },
  tires_gone: {
    code: "not_enough_stock",
    message: "The shop no longer has enough of these tires to hold them for you: call the shop, who can order them or offer others.",
  },
  too_late: { code: "too_late", message: "It is too late to cancel this fitting online: call the shop." },
  not_booked: { code: "not_booked", message: "No fitting is booked on this offer, so there is nothing to cancel: choose a time to accept it, or simply let it expire." },
};

export function refusedOffer(reason: OfferRefusalReason, nextSlots?: FittingSlot[]): OfferRefusal {
  return { ok: false, reason, ...REFUSALS[reason], ...(nextSlots && nextSlots.length > 0 ? { nextSlots } : {}) };
}
