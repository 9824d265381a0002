import Link from "next/link";
import { formatTime } from "@/lib/format/format";
import type { FittingListing } from "@/lib/offers/queries";
import { FittingOutcomeButtons } from "./fitting-outcome-buttons";
import { OfferStatusBadge } from "./offer-status-badge";
import { OfferTireLines } from "./offer-tire-lines";

/** One fitting: when, who (with a number to call), which car and tires, its status, and the buttons to mark it while booked. */
export function FittingCard({ fitting, timeZone, showBay = false }: { fitting: FittingListing; timeZone: string; showBay?: boolean }) {
  const { customer } = fitting;
  const slot = fitting.fitting!;
  return (
    <article data-offer-id={fitting.id} aria-labelledby={`fitting-${fitting.id}`} className="flex flex-col gap-2 rounded border border-rule bg-sheet p-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 id={`fitting-${fitting.id}`} className="font-semibold">
          <time dateTime={slot.start.toISOString()}>{formatTime(slot.start, { timeZone })}</time>
          {showBay ? ` · bay ${slot.bay}` : ""} ·{" "}
          <Link href={`/counter/requests/${fitting.requestId}`} prefetch={false} className="text-accent underline underline-offset-4">
            {customer.name}
          </Link>
        </h3>
        <OfferStatusBadge status={fitting.status} />
      </div>
      <p className="text-sm">
        {customer.phone ? (
          <a href={`tel:${customer.phone.replace(/[^\d+]/g, "")}`} className="text-accent underline underline-offset-4">
            {customer.phone}
          </a>
        ) : (
          <span className="text-ink-soft">no phone given</span>
        )}{" "}
        · {customer.vehicle}
      </p>
      <OfferTireLines lines={fitting.lines} />
      {fitting.status === "accepted" ? <FittingOutcomeButtons offerId={fitting.id} requestId={fitting.requestId} who={customer.name} /> : null}
    </article>
  );
}
