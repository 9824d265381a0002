import { formatCalendarDate } from "@/lib/format/format";
import { refusedOffer } from "@/lib/offers/refusals";
import type { PublicOffer } from "@/lib/offers/public-offer";

/** An offer's status as a short label and a sentence saying what the driver can do now. */
export function offerStatusWords(offer: Pick<PublicOffer, "status" | "validUntilDate" | "timeZone">): { label: string; text: string } {
  switch (offer.status) {
    case "open":
      return { label: "Open", text: `Accept it by choosing a fitting time before the end of ${formatCalendarDate(offer.validUntilDate, "full")} (${offer.timeZone} time).` };
    case "accepted":
      return { label: "Booked", text: "Your fitting is booked and the shop holds these tires for you." };
    case "expired":
    case "withdrawn":
    case "cancelled":
      return { label: offer.status === "expired" ? "Expired" : offer.status === "withdrawn" ? "Withdrawn" : "Cancelled", text: refusedOffer(offer.status).message };
    case "fitted":
      return { label: "Fitted", text: "These tires were fitted. Thank you for choosing the shop." };
    case "no-show":
      return { label: "Fitting missed", text: "The booked fitting was missed and the tires went back on sale: call the shop to ask for a new offer." };
  }
}
