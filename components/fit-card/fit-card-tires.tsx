import type { CardTire } from "@/lib/fit-cards/read-card";
import { formatPrice } from "@/lib/money/money";
import { EstimateBreakdown } from "@/components/ui/estimate-breakdown";
import { StockLine } from "@/components/ui/stock-line";
import { TireSizeLine } from "@/components/ui/tire-size-line";
import { TireVerdictList } from "@/components/ui/tire-verdict";

function priceLine(tire: CardTire): string {
  if (!tire.stillStocked) return `${formatPrice(tire.priceCentsAtSave)} when saved · no longer stocked`;
  if (tire.priceCents === tire.priceCentsAtSave) return `${formatPrice(tire.priceCents)} each`;
  return `${formatPrice(tire.priceCents)} each today (${formatPrice(tire.priceCentsAtSave)} when saved)`;
}

/**
 * The tires the shop picked, each with today's price and stock (read now, against the `needed` set),
 * what the set costs out the door, and why it fits, or what it changes.
 */
export function FitCardTires({ tires, needed }: { tires: CardTire[]; needed: number }) {
  if (tires.length === 0) return null;
  return (
    <section aria-labelledby="card-tires-heading" className="flex flex-col gap-3">
      <h2 id="card-tires-heading" className="text-xl font-semibold">
        Tires picked for you
      </h2>
      <ul className="grid gap-3 md:grid-cols-2 print:grid-cols-3 print:gap-1">
        {tires.map((tire) => (
          <li key={tire.sku} className="rounded border border-rule bg-sheet p-4 print:break-inside-avoid">
            <h3 className="font-semibold">
              {tire.brand} {tire.line}
            </h3>
            <TireSizeLine tire={tire} diameterDiffPct={tire.diameterDiffPct} />
            <p className="mt-1 font-semibold">{priceLine(tire)}</p>
            {tire.stillStocked ? <StockLine quantity={tire.quantity} needed={needed} /> : <p className="text-sm text-ink-soft">Ask the shop for a current choice</p>}
            <TireVerdictList verdict={tire} />
            {tire.wear ? (
              <p className="mt-2 border-l-4 border-rule pl-3 text-sm" data-wear={tire.wear.verdict}>
                <span className="font-semibold">Tread depth: </span>
                {tire.wear.words}
              </p>
            ) : null}
            {tire.stillStocked ? <EstimateBreakdown estimate={tire.estimate} className="mt-3 print:p-1" /> : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
