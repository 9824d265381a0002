import { ShopCard } from "@/components/fit-card/shop-card";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import type { PublicOffer } from "@/lib/offers/public-offer";
import type { ShopContact } from "@/lib/shop/queries";
import { OfferAppointment } from "./offer-appointment";
import { OfferBooking } from "./offer-booking";
import { OfferHeader } from "./offer-header";
import { OfferLines } from "./offer-lines";

interface OfferViewProps {
  offer: PublicOffer;
  token: string;
  shop: ShopContact | null;
  /** Today in the shop's zone, the first day of free times. */
  today: string;
  slotDays: number;
  canCancel: boolean;
}

/** A priced offer as its driver sees it: on screen with the booking, and on paper without. */
export function OfferView({ offer, token, shop, today, slotDays, canCancel }: OfferViewProps) {
  const { appointment } = offer;
  return (
    <article className="flex flex-col gap-6 print:gap-3">
      <OfferHeader offer={offer} />
      {offer.status === "accepted" && appointment ? <OfferAppointment offer={{ ...offer, appointment }} token={token} canCancel={canCancel} /> : null}
      <OfferLines offer={offer} />
      {offer.status === "open" ? (
        <section aria-labelledby="booking-heading" className="flex flex-col gap-3 rounded border border-rule bg-sheet p-4 print:hidden">
          <h2 id="booking-heading" className="text-xl font-semibold">
            Choose a fitting time
          </h2>
          <p>Accepting books a fitting bay for you and holds these tires until the end of that day.</p>
          <OfferBooking token={token} timeZone={offer.timeZone} firstDay={today} windowDays={slotDays} phone={offer.shop.phone} />
        </section>
      ) : null}
      {shop ? <ShopCard shop={shop} /> : null}
      <SafetyCautions />
    </article>
  );
}
