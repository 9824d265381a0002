import { formatLength, formatRevolutions, type UnitSystem } from "@/lib/tire/display";
import { type Geometry } from "@/lib/tire/geometry";

const unitHeading: Record<UnitSystem, string> = { metric: "Metric", imperial: "Imperial" };

function rowsFor(geometry: Geometry): [string, (units: UnitSystem) => string][] {
  return [
    ["Overall diameter", (units) => formatLength(geometry.overallDiameterMm, units)],
    ["Section width", (units) => formatLength(geometry.sectionWidthMm, units)],
    ["Sidewall height", (units) => formatLength(geometry.sidewallMm, units)],
    ["Rim diameter", (units) => formatLength(geometry.rimDiameterMm, units)],
    ["Circumference", (units) => formatLength(geometry.circumferenceMm, units)],
    ["Revolutions", (units) => formatRevolutions(geometry.revsPerKm, geometry.revsPerMile, units)],
    ["Rolling circumference (estimate)", (units) => formatLength(geometry.rolling.circumferenceMm, units)],
    ["Rolling revolutions (estimate)", (units) => formatRevolutions(geometry.rolling.revsPerKm, geometry.rolling.revsPerMile, units)],
  ];
}

/** A size's numbers as a table, in one unit system or side by side in both; also the drawing's text equivalent. */
export function MeasurementsTable({ geometry, unitSystems, caption }: { geometry: Geometry; unitSystems: UnitSystem[]; caption: string }) {
  const both = unitSystems.length > 1;
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="mb-2 text-left text-xs tracking-wide text-ink-soft uppercase">{caption}</caption>
      {both ? (
        <thead>
          <tr>
            <td />
            {unitSystems.map((units) => (
              <th key={units} scope="col" className="pb-1 text-right text-xs font-semibold text-ink-soft">
                {unitHeading[units]}
              </th>
            ))}
          </tr>
        </thead>
      ) : null}
      <tbody>
        {rowsFor(geometry).map(([label, value]) => (
          <tr key={label} className="border-t border-rule">
            <th scope="row" className="py-1.5 pr-3 text-left font-normal text-ink-soft">
              {label}
            </th>
            {unitSystems.map((units) => (
              <td key={units} className={`py-1.5 pl-3 text-right font-mono text-ink ${both ? "sm:whitespace-nowrap" : "whitespace-nowrap"}`}>
                {value(units)}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
