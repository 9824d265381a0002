import { LabelledRows } from "@/components/ui/labelled-rows";
import type { ReactNode } from "react";
import { formatDateTime, formatCalendarDate, formatTime } from "@/lib/format/format";
import { formatPrice } from "@/lib/money/money";
import { offerUrl } from "@/lib/offers/create-offer";
import type { OfferSummary } from "@/lib/offers/queries";
import { OfferStatusBadge } from "./offer-status-badge";
import { OfferTireLines } from "./offer-tire-lines";
import { OfferWithdraw } from "./offer-withdraw";

/** A request's offers, newest first: status, tires, the frozen total, how long each holds, the fitting when booked, the link. */
export function RequestOffers({ offers, timeZone }: { offers: OfferSummary[]; timeZone: string }) {
  if (offers.length === 0) return <p className="text-ink-soft">No offer yet.</p>;
  return (
    <ol className="flex flex-col gap-3">
      {offers.map((offer) => {
        const url = offerUrl(offer.token);
        const rows: [string, ReactNode][] = [
          ["Tires", <OfferTireLines key="l" lines={offer.lines} priced />],
          ["Out the door", `${formatPrice(offer.estimate.totalCents)} for ${offer.estimate.quantity} (as sent)`],
          ["Valid until", `the end of ${formatCalendarDate(offer.validUntilDate)}`],
          ["Sent", <time key="s" dateTime={offer.createdAt.toISOString()}>{formatDateTime(offer.createdAt, { timeZone })}</time>],
        ];
        if (offer.fitting) {
          const { bay, start, end, held } = offer.fitting;
          rows.push(["Fitting", `${formatDateTime(start, { timeZone })} to ${formatTime(end, { timeZone })}, bay ${bay}${held ? " · tires held" : ""}`]);
        }
        if (offer.message) rows.push(["Message", offer.message]);
        rows.push(["Link", <a key="u" href={url} className="font-mono text-sm break-all text-accent underline underline-offset-4">{url}</a>]);
        return (
          <li key={offer.id} data-offer-id={offer.id} className="flex flex-col gap-3 rounded border border-rule bg-sheet p-4">
            <div className="flex flex-wrap items-center gap-3">
              <h3 className="font-semibold">Offer #{offer.id}</h3>
              <OfferStatusBadge status={offer.status} />
            </div>
            <LabelledRows rows={rows} className="gap-y-1 sm:grid-cols-[8rem_minmax(0,1fr)]" />
            {offer.status === "open" ? <OfferWithdraw offerId={offer.id} requestId={offer.requestId} /> : null}
          </li>
        );
      })}
    </ol>
  );
}
