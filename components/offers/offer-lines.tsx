import { EstimateBreakdown } from "@/components/ui/estimate-breakdown";
import { StockLine } from "@/components/ui/stock-line";
import { TireSizeLine } from "@/components/ui/tire-size-line";
import { TireVerdictList } from "@/components/ui/tire-verdict";
import { formatCalendarDate, formatDay } from "@/lib/format/format";
import { formatPrice } from "@/lib/money/money";
import type { PublicOffer } from "@/lib/offers/public-offer";

/**
 * The tires offered, each with how many, the price each and its verdict against the tire on the car,
 * then the package's estimate as frozen when the offer was sent. Stock is shown only while the offer
 * is open: once booked, the tires are held and no longer count as on hand.
 */
export function OfferLines({ offer }: { offer: PublicOffer }) {
  const prices = new Set(offer.lines.map((line) => line.priceCents));
  return (
    <section aria-labelledby="offer-tires-heading" className="grid gap-3 md:grid-cols-[minmax(0,1fr)_22rem] md:items-start print:grid-cols-[minmax(0,1fr)_22rem]">
      <h2 id="offer-tires-heading" className="text-xl font-semibold md:col-span-2 print:col-span-2">
        The tires
      </h2>
      <ul className="flex flex-col gap-3 print:gap-1">
        {offer.lines.map(({ tire, quantity, priceCents, verdict }) => (
          <li key={tire.sku} className="rounded border border-rule bg-sheet p-4 print:break-inside-avoid" data-sku={tire.sku}>
            <h3 className="font-semibold">
              {tire.brand} {tire.line}
            </h3>
            <TireSizeLine tire={tire} diameterDiffPct={verdict?.diameterDiffPct} />
            <p className="text-sm text-ink-soft">
              {tire.season} · {tire.terrain}
              {tire.runFlat ? " · Run-flat" : ""}
              {tire.threePeak ? " · 3PMSF" : ""}
            </p>
            <p className="mt-1 font-semibold">
              {quantity} × {formatPrice(priceCents)} each
            </p>
            {offer.status === "open" ? <StockLine quantity={tire.quantity} needed={quantity} /> : null}
            {verdict ? (
              <TireVerdictList verdict={verdict} />
            ) : (
              <p className="mt-2 text-sm">The request did not name the tire on the car, so this one is not measured against it: check it against your vehicle&apos;s tire placard.</p>
            )}
          </li>
        ))}
      </ul>
      <div className="flex flex-col gap-1">
        <EstimateBreakdown estimate={offer.estimate} level={3} mixedPrices={prices.size > 1} className="bg-sheet print:p-1" />
        <p className="text-sm">
          Priced on {formatDay(offer.createdAt, { timeZone: offer.timeZone, long: true })}
          {offer.status === "open" ? (
            <>
              ; valid until the end of <span className="font-semibold">{formatCalendarDate(offer.validUntilDate, "long")}</span> ({offer.timeZone} time)
            </>
          ) : null}
          .
        </p>
      </div>
    </section>
  );
}
