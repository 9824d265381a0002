import type { PlacardMinimums } from "@/lib/finder/finder-state";
import { formatLength, formatLoad, formatSpeed, type UnitSystem } from "@/lib/tire/display";
import { formatServiceDescription, formatSize } from "@/lib/tire/format";
import { loadIndexKg } from "@/lib/tire/load-index";
import { rimTwinCaution } from "@/lib/tire/rim-twins";
import type { Marking } from "@/lib/tire/types";

const higher = (own: number | null, minimum: number | null) => (minimum !== null && (own === null || minimum > own) ? minimum : own);

/** The tire being replaced and the rules every result below has passed, the Placard check's minimums included. */
export function OriginalSummary({ original, units, tolerancePct, minimums }: { original: Marking; units: UnitSystem; tolerancePct: number; minimums: PlacardMinimums }) {
  const { size, service, geometry } = original;
  if (!size || !service || !geometry) return null;
  const diameter = geometry.overallDiameterMm;
  const single = higher(service.loadIndex, minimums.loadIndex) as number;
  const dual = higher(service.loadIndexDual, minimums.loadIndexDual);
  const rules = [
    `Same ${size.rimDiameterIn}-inch rim diameter and construction`,
    `Overall diameter ${formatLength(diameter, units)} ± ${tolerancePct} % (${formatLength(diameter * (1 - tolerancePct / 100), units)}–${formatLength(diameter * (1 + tolerancePct / 100), units)})`,
    `Load index ${single} (${formatLoad(loadIndexKg(single) ?? 0, units)}) or higher`,
    dual === null ? null : `A dual load index of ${dual} (${formatLoad(loadIndexKg(dual) ?? 0, units)}) or higher: rated for dual wheels`,
    `Speed ${service.speedSymbol} (${formatSpeed(service.speedKmh, units)}) or faster`,
    original.loadRange ? `Load range ${original.loadRange} or stronger` : null,
    size.runFlat ? "Run-flat, like the current tire" : null,
  ];
  const rimCaution = rimTwinCaution(size.rimDiameterIn);
  return (
    <section aria-labelledby="original-heading" className="rounded border border-rule bg-sheet p-4">
      <h2 id="original-heading" className="text-sm text-ink-soft">
        Replacing
      </h2>
      <p className="font-mono text-2xl font-semibold">
        {formatSize(size)} {formatServiceDescription(service)}
      </p>
      <p className="mt-3 text-sm font-semibold">Every result has:</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm">
        {rules.filter(Boolean).map((rule) => (
          <li key={rule}>{rule}</li>
        ))}
      </ul>
      {rimCaution ? <p className="mt-2 text-sm">{rimCaution}</p> : null}
    </section>
  );
}
