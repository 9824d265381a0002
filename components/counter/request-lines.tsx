import { EstimateBreakdown } from "@/components/ui/estimate-breakdown";
import { StockLine } from "@/components/ui/stock-line";
import type { QuoteLine } from "@/lib/quotes/quote-lines";
import { formatPrice } from "@/lib/money/money";
import { formatServiceDescription } from "@/lib/tire";

/**
 * The catalog tires a request names, each with how many are on hand against the quantity asked for
 * and what that many cost out the door today. Nothing shows for a request that names none.
 */
export function RequestLines({ lines, quantity }: { lines: QuoteLine[]; quantity: number }) {
  if (lines.length === 0) return null;
  return (
    <section aria-labelledby="request-lines-heading" className="flex flex-col gap-3">
      <h2 id="request-lines-heading" className="text-xl font-semibold">
        Catalog tires in the request
      </h2>
      <p className="text-ink-soft">As the page the driver wrote from named them, read now: today&apos;s price and stock, priced for {quantity}.</p>
      <ul className="grid gap-3 md:grid-cols-2">
        {lines.map(({ tire, stillStocked, estimate }) => (
          <li key={tire.sku} data-sku={tire.sku} className="rounded border border-rule bg-sheet p-4">
            <h3 className="font-semibold">
              {tire.brand} {tire.line}
            </h3>
            <p className="font-mono text-sm">
              {tire.designation} {formatServiceDescription(tire)} · SKU {tire.sku}
            </p>
            <p className="mt-1 font-semibold">{formatPrice(tire.priceCents)} each</p>
            {stillStocked ? <StockLine quantity={tire.quantity} needed={quantity} /> : <p className="text-sm text-ink-soft">Retired from the catalog since the request</p>}
            {estimate ? <EstimateBreakdown estimate={estimate} className="mt-3" /> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
