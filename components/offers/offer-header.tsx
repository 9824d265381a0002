import { PageIntro } from "@/components/ui/page-intro";
import type { PublicOffer } from "@/lib/offers/public-offer";
import { offerStatusWords } from "./offer-status-words";

const GONE = new Set(["expired", "withdrawn", "cancelled", "no-show"]);

/** Who the offer is from, its status in words, the vehicle and the tire on it, and the shop's note. */
export function OfferHeader({ offer }: { offer: PublicOffer }) {
  const status = offerStatusWords(offer);
  const gone = GONE.has(offer.status);
  return (
    <div className="flex flex-col gap-4">
      <PageIntro eyebrow={offer.shop.name} title="Your offer">
        <p>
          For your {offer.vehicle}
          {offer.original ? (
            <>
              , measured against the tire on it now: <span className="font-mono">{offer.original}</span>
            </>
          ) : null}
          .
        </p>
      </PageIntro>
      <div className={`-mt-4 rounded border-l-4 p-4 ${gone ? "border-danger bg-sheet" : "border-accent bg-accent-soft"}`} data-offer-status={offer.status}>
        <p className="font-semibold">Status: {status.label}</p>
        <p>{status.text}</p>
        {gone ? <p className="mt-1">The shop&apos;s phone, e-mail and address are at the foot of this page.</p> : null}
      </div>
      {offer.message ? (
        <section aria-labelledby="offer-note-heading" className="rounded border-l-4 border-accent bg-sheet p-4">
          <h2 id="offer-note-heading" className="font-semibold">
            A note from the shop
          </h2>
          <p className="mt-1 whitespace-pre-line">{offer.message}</p>
        </section>
      ) : null}
    </div>
  );
}
