import { formatLength, formatLoad, formatSize, formatSpeed, type Marking, type UnitSystem } from "@/lib/tire";

/** The tire being replaced and the rules every result below has passed. */
export function OriginalSummary({ original, units, tolerancePct }: { original: Marking; units: UnitSystem; tolerancePct: number }) {
  const { size, service, geometry } = original;
  if (!size || !service || !geometry) return null;
  const diameter = geometry.overallDiameterMm;
  const rules = [
    `Same ${size.rimDiameterIn}-inch rim diameter and construction`,
    `Overall diameter ${formatLength(diameter, units)} ± ${tolerancePct} % (${formatLength(diameter * (1 - tolerancePct / 100), units)}–${formatLength(diameter * (1 + tolerancePct / 100), units)})`,
    `Load index ${service.loadIndex} (${formatLoad(service.loadKg, units)}) or higher`,
    `Speed ${service.speedSymbol} (${formatSpeed(service.speedKmh, units)}) or faster`,
    original.loadRange ? `Load range ${original.loadRange} or stronger` : null,
    size.runFlat ? "Run-flat, like the current tire" : null,
  ];
  return (
    <section aria-labelledby="original-heading" className="rounded border border-rule bg-sheet p-4">
      <h2 id="original-heading" className="text-sm text-ink-soft">
        Replacing
      </h2>
      <p className="font-mono text-2xl font-semibold">
        {formatSize(size)} {service.loadIndex}
        {service.loadIndexDual ? `/${service.loadIndexDual}` : ""}
        {service.speedSymbol}
      </p>
      <p className="mt-3 text-sm font-semibold">Every result has:</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm">
        {rules.filter(Boolean).map((rule) => (
          <li key={rule}>{rule}</li>
        ))}
      </ul>
    </section>
  );
}
