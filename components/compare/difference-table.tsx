import { Fragment, useId } from "react";
import { type ComparedSize } from "@/lib/tire/compare";
import { formatLength, formatOneDecimal, formatSignedPercent, type UnitSystem } from "@/lib/tire/display";
import { SizeHeading, SizeLabel } from "./size-label";

function signedLength(mm: number, units: UnitSystem): string {
  const text = formatLength(Math.abs(mm), units);
  if (Math.abs(mm) < 0.05) return text;
  return `${mm > 0 ? "+" : "−"}${text}`;
}

const otherUnits = (units: UnitSystem): UnitSystem => (units === "metric" ? "imperial" : "metric");

interface Row {
  label: string;
  value: (size: ComparedSize, units: UnitSystem) => string;
  /** The same figure in the other unit system, shown smaller beneath. */
  also?: (size: ComparedSize, units: UnitSystem) => string;
}

const rows: Row[] = [
  { label: "Overall diameter", value: (size, units) => formatLength(size.overallDiameterMm, units), also: (size, units) => formatLength(size.overallDiameterMm, otherUnits(units)) },
  { label: "Diameter change", value: (size) => formatSignedPercent(size.diameterDiffPct) },
  { label: "Section width", value: (size, units) => formatLength(size.sectionWidthMm, units) },
  { label: "Sidewall height", value: (size, units) => formatLength(size.sidewallMm, units) },
  { label: "Circumference", value: (size, units) => formatLength(size.circumferenceMm, units) },
  { label: "Revolutions per mile", value: (size) => formatOneDecimal(size.revsPerMile) },
  { label: "Ground clearance change", value: (size, units) => signedLength(size.clearanceChangeMm, units) },
];

function Figure({ row, size, units }: { row: Row; size: ComparedSize; units: UnitSystem }) {
  return (
    <>
      {row.value(size, units)}
      {row.also ? <span className="block text-xs text-ink-soft">{row.also(size, units)}</span> : null}
    </>
  );
}

/**
 * Every size's numbers against the reference: one column per size where the space allows four, else
 * (on a phone) one block per size. The unused form is `display: none`, so it is neither seen nor read.
 */
export function DifferenceTable({ sizes, units }: { sizes: ComparedSize[]; units: UnitSystem }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="@container flex flex-col gap-2">
      <h2 id={headingId} className="text-xs tracking-wide text-ink-soft uppercase">
        Differences from the reference (nominal sizes)
      </h2>
      <table aria-labelledby={headingId} className="hidden w-full border-collapse text-sm @min-[34rem]:table">
        <thead>
          <tr>
            <td />
            {sizes.map((size, index) => (
              <th key={`${size.designation}-${index}`} scope="col" className="pb-2 pl-3 text-right align-bottom">
                <SizeLabel designation={size.designation} index={index} />
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.label} className="border-t border-rule">
              <th scope="row" className="py-1.5 pr-2 text-left align-top font-normal text-ink-soft">
                {row.label}
              </th>
              {sizes.map((size, index) => (
                <td key={`${size.designation}-${index}`} className="py-1.5 pl-3 text-right align-top font-mono whitespace-nowrap">
                  <Figure row={row} size={size} units={units} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <ul className="grid gap-3 @min-[34rem]:hidden">
        {sizes.map((size, index) => (
          <li key={`${size.designation}-${index}`} className="rounded border border-rule bg-sheet p-3">
            <SizeHeading designation={size.designation} index={index} />
            <dl className="mt-1 grid grid-cols-[minmax(0,1fr)_auto] gap-x-3 text-sm">
              {rows.map((row) => (
                <Fragment key={row.label}>
                  <dt className="py-1 text-ink-soft">{row.label}</dt>
                  <dd className="py-1 text-right font-mono">
                    <Figure row={row} size={size} units={units} />
                  </dd>
                </Fragment>
              ))}
            </dl>
          </li>
        ))}
      </ul>
    </section>
  );
}
