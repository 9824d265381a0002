import { formatLength, formatRevolutions, type UnitSystem } from "@/lib/tire/display";
import type { Geometry } from "@/lib/tire";

/** The drawing's numbers as a table: its text equivalent, and the figures a fitter asks for. */
export function MeasurementsTable({ geometry, units, caption }: { geometry: Geometry; units: UnitSystem; caption: string }) {
  const rows: [string, string][] = [
    ["Overall diameter", formatLength(geometry.overallDiameterMm, units)],
    ["Section width", formatLength(geometry.sectionWidthMm, units)],
    ["Sidewall height", formatLength(geometry.sidewallMm, units)],
    ["Rim diameter", formatLength(geometry.rimDiameterMm, units)],
    ["Circumference", formatLength(geometry.circumferenceMm, units)],
    ["Revolutions", formatRevolutions(geometry.revsPerKm, geometry.revsPerMile, units)],
    ["Rolling circumference (estimate)", formatLength(geometry.rolling.circumferenceMm, units)],
    ["Rolling revolutions (estimate)", formatRevolutions(geometry.rolling.revsPerKm, geometry.rolling.revsPerMile, units)],
  ];
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-2 text-left text-xs tracking-wide text-ink-soft uppercase">{caption}</caption>
      <tbody>
        {rows.map(([label, value]) => (
          <tr key={label} className="border-t border-rule">
            <th scope="row" className="py-1.5 pr-3 text-left font-normal text-ink-soft">
              {label}
            </th>
            <td className="py-1.5 text-right font-mono whitespace-nowrap text-ink">{value}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
