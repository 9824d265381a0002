import { type ComparedSize, formatLength, formatOneDecimal, formatSignedPercent, type UnitSystem } from "@/lib/tire";
import { LineSample } from "./size-list-editor";

function signedLength(mm: number, units: UnitSystem): string {
  const text = formatLength(Math.abs(mm), units);
  if (Math.abs(mm) < 0.05) return text;
  return `${mm > 0 ? "+" : "−"}${text}`;
}

const rows: [string, (size: ComparedSize, units: UnitSystem) => string][] = [
  ["Overall diameter", (size, units) => `${formatLength(size.overallDiameterMm, units)} (${formatLength(size.overallDiameterMm, units === "metric" ? "imperial" : "metric")})`],
  ["Diameter change", (size) => formatSignedPercent(size.diameterDiffPct)],
  ["Section width", (size, units) => formatLength(size.sectionWidthMm, units)],
  ["Sidewall height", (size, units) => formatLength(size.sidewallMm, units)],
  ["Circumference", (size, units) => formatLength(size.circumferenceMm, units)],
  ["Revolutions per mile", (size) => formatOneDecimal(size.revsPerMile)],
  ["Ground clearance change", (size, units) => signedLength(size.clearanceChangeMm, units)],
];

/** Every size's numbers against the reference, one column per size. */
export function DifferenceTable({ sizes, units }: { sizes: ComparedSize[]; units: UnitSystem }) {
  return (
    <div className="overflow-x-auto" tabIndex={0} role="region" aria-label="Differences from the reference">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-2 text-left text-xs tracking-wide text-ink-soft uppercase">Differences from the reference (nominal sizes)</caption>
        <thead>
          <tr>
            <td />
            {sizes.map((size, index) => (
              <th key={`${size.designation}-${index}`} scope="col" className="px-2 pb-2 text-right align-bottom font-mono font-semibold whitespace-nowrap">
                <span className="flex items-center justify-end gap-2">
                  <LineSample index={index} />
                  {size.designation}
                </span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, value]) => (
            <tr key={label} className="border-t border-rule">
              <th scope="row" className="py-1.5 pr-3 text-left font-normal whitespace-nowrap text-ink-soft">
                {label}
              </th>
              {sizes.map((size, index) => (
                <td key={`${size.designation}-${index}`} className="px-2 py-1.5 text-right font-mono whitespace-nowrap">
                  {value(size, units)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
