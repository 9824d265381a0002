import { useId } from "react";
import type { Estimate } from "@/lib/money/estimate";
import { formatPrice } from "@/lib/money/money";

export const ESTIMATE_CAVEAT = "Estimate — the shop confirms the price.";

/**
 * What a set costs out the door, line by line: the tires, fitting, disposal and fees, tax and the
 * total, marked as an estimate the shop confirms. Figures come from lib/money/estimate.ts.
 */
export function EstimateBreakdown({ estimate, mixed = false, className = "" }: { estimate: Estimate; mixed?: boolean; className?: string }) {
  const id = useId();
  const { quantity } = estimate;
  const tires = `${quantity} ${quantity === 1 ? "tire" : "tires"}`;
  const rows: [string, number][] = [
    [mixed ? tires : `${tires} × ${formatPrice(estimate.tiresCents / quantity)}`, estimate.tiresCents],
    ["Fitting", estimate.servicesCents],
    ["Disposal & fees", estimate.feesCents],
    ["Tax", estimate.taxCents],
  ];
  return (
    <section aria-labelledby={`${id}-title`} data-estimate-total={estimate.totalCents} className={`rounded border border-rule p-3 text-sm ${className}`}>
      <h4 id={`${id}-title`} className="font-semibold">
        Out the door for {quantity}: {formatPrice(estimate.totalCents)}
      </h4>
      <dl className="mt-1 grid grid-cols-[minmax(0,1fr)_auto]">
        {rows.map(([label, cents]) => (
          <div key={label} className="contents">
            <dt className="text-ink-soft">{label}</dt>
            <dd className="pl-4 text-right font-mono tabular-nums">{formatPrice(cents)}</dd>
          </div>
        ))}
        <div className="contents font-semibold">
          <dt className="border-t border-rule">Total</dt>
          <dd className="border-t border-rule pl-4 text-right font-mono tabular-nums">{formatPrice(estimate.totalCents)}</dd>
        </div>
      </dl>
      <p className="mt-1 text-xs text-ink-soft">{ESTIMATE_CAVEAT}</p>
    </section>
  );
}
