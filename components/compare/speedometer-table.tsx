import { type ComparedSize, formatInteger, formatOneDecimal, type UnitSystem } from "@/lib/tire";

/** What the speedometer shows and how fast the car really goes on each size. */
export function SpeedometerTable({ sizes, units }: { sizes: ComparedSize[]; units: UnitSystem }) {
  const metric = units === "metric";
  const unit = metric ? "km/h" : "mph";
  const rowIndexes = metric ? [0, 1, 2, 3] : [4, 5, 6, 7];
  const reference = sizes[0];
  if (!reference) return null;
  return (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Speedometer readings">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-2 text-left text-xs tracking-wide text-ink-soft uppercase">True speed when the speedometer shows…</caption>
        <thead>
          <tr>
            <th scope="col" className="pb-2 text-left font-normal text-ink-soft">
              Shown
            </th>
            {sizes.slice(1).map((size, index) => (
              <th key={`${size.designation}-${index}`} scope="col" className="px-2 pb-2 text-right font-mono font-semibold whitespace-nowrap">
                {size.designation}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rowIndexes.map((rowIndex) => {
            const shown = reference.speedometer[rowIndex]!;
            return (
              <tr key={rowIndex} className="border-t border-rule">
                <th scope="row" className="py-1.5 text-left font-mono font-normal whitespace-nowrap">
                  {formatInteger(metric ? shown.shownKmh : shown.shownMph)} {unit}
                </th>
                {sizes.slice(1).map((size, index) => {
                  const row = size.speedometer[rowIndex]!;
                  return (
                    <td key={`${size.designation}-${index}`} className={`px-2 py-1.5 text-right font-mono whitespace-nowrap ${size.readsBelowTrue ? "font-semibold text-danger" : ""}`}>
                      {formatOneDecimal(metric ? row.trueKmh : row.trueMph)} {unit}
                    </td>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
      {sizes.some((size) => size.readsBelowTrue) ? (
        <p className="mt-2 border-l-4 border-danger px-3 py-1 text-sm">
          Sizes in bold red are taller than the reference: the speedometer would show less than the true speed. UN Regulation No. 39 (§5.3) requires a
          speedometer never to read below the true speed, so such a change may need the speedometer recalibrated.
        </p>
      ) : null}
    </div>
  );
}
