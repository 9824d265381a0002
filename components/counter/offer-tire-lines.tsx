import type { OfferLineSummary } from "@/lib/offers/queries";
import { formatPrice } from "@/lib/money/money";
import { formatServiceDescription } from "@/lib/tire";

/** An offer's tires: "4 × Brand Line 225/65R17 102H", with the price each when `priced`. */
export function OfferTireLines({ lines, priced = false }: { lines: OfferLineSummary[]; priced?: boolean }) {
  return (
    <ul className="list-none">
      {lines.map((line) => (
        <li key={line.sku} className="break-words">
          {line.quantity} × {line.brand} {line.line} <span className="font-mono text-sm">{line.designation} {formatServiceDescription(line)}</span>
          {priced ? <span className="text-ink-soft"> · {formatPrice(line.priceCents)} each · SKU {line.sku}</span> : null}
        </li>
      ))}
    </ul>
  );
}
