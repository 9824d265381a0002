import { Fragment, useId } from "react";
import { type ComparedSize, type SpeedometerRow } from "@/lib/tire/compare";
import { formatSpeed, formatSpeedToTenth, type UnitSystem } from "@/lib/tire/display";
import { R39_SOURCE, speedometerVerdict } from "@/lib/tire/speedometer-check";
import { VERDICT_MARK } from "@/lib/tire/speedometer-words";
import { SizeHeading, SizeLabel } from "./size-label";

interface Reading {
  text: string;
  /** Words for a reading §5.3 forbids (also shown in the alarm colour); null for any other. */
  mark: string | null;
}

function reading(row: SpeedometerRow, referenceMm: number, size: ComparedSize, units: UnitSystem): Reading {
  return { text: formatSpeedToTenth(row.trueKmh, units), mark: VERDICT_MARK[speedometerVerdict(row.shownKmh, referenceMm, size.overallDiameterMm)] };
}

function ReadingText({ value }: { value: Reading }) {
  return (
    <span data-breaks-rule={value.mark ? "true" : undefined} className={value.mark ? "font-semibold text-danger" : undefined}>
      {value.text}
      {value.mark ? <span className="block font-sans text-xs">{value.mark}</span> : null}
    </span>
  );
}

/**
 * What the speedometer shows and how fast the car really goes on each size: a table where the space
 * allows, else one block per size; readings UN Regulation No. 39 §5.3 forbids are marked in words.
 */
export function SpeedometerTable({ sizes, units }: { sizes: ComparedSize[]; units: UnitSystem }) {
  const headingId = useId();
  const [reference, ...others] = sizes;
  if (!reference) return null;
  // The rows hold the kilometre speeds first, then the mile speeds.
  const inUnits = (rows: SpeedometerRow[]) => (units === "metric" ? rows.slice(0, 4) : rows.slice(4));
  const shownRows = inUnits(reference.speedometer);
  const readings = others.map((size) => inUnits(size.speedometer).map((row) => reading(row, reference.overallDiameterMm, size, units)));
  return (
    <section aria-labelledby={headingId} className="@container flex flex-col gap-2">
      <h2 id={headingId} className="text-xs tracking-wide text-ink-soft uppercase">
        True speed when the speedometer shows…
      </h2>
      <table aria-labelledby={headingId} className="hidden w-full border-collapse text-sm @min-[34rem]:table">
        <thead>
          <tr>
            <th scope="col" className="pb-2 text-left align-bottom font-normal text-ink-soft">
              Shown
            </th>
            {others.map((size, index) => (
              <th key={`${size.designation}-${index}`} scope="col" className="pb-2 pl-3 text-right align-bottom">
                <SizeLabel designation={size.designation} index={index + 1} />
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {shownRows.map((shown, rowIndex) => (
            <tr key={shown.shownKmh} className="border-t border-rule">
              <th scope="row" className="py-1.5 text-left align-top font-mono font-normal whitespace-nowrap">
                {formatSpeed(shown.shownKmh, units)}
              </th>
              {others.map((size, index) => (
                <td key={`${size.designation}-${index}`} className="py-1.5 pl-3 text-right align-top font-mono whitespace-nowrap">
                  <ReadingText value={readings[index]![rowIndex]!} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <ul className="grid gap-3 @min-[34rem]:hidden">
        {others.map((size, index) => (
          <li key={`${size.designation}-${index}`} className="rounded border border-rule bg-sheet p-3">
            <SizeHeading designation={size.designation} index={index + 1} />
            <dl className="mt-1 grid grid-cols-[minmax(0,1fr)_auto] gap-x-3 text-sm">
              {shownRows.map((shown, rowIndex) => (
                <Fragment key={shown.shownKmh}>
                  <dt className="py-1 text-ink-soft">Shows {formatSpeed(shown.shownKmh, units)}</dt>
                  <dd className="py-1 text-right font-mono">
                    <ReadingText value={readings[index]![rowIndex]!} />
                  </dd>
                </Fragment>
              ))}
            </dl>
          </li>
        ))}
      </ul>
      {readings.flat().some((value) => value.mark) ? (
        <p className="border-l-4 border-danger px-3 py-1 text-sm">
          Readings marked “{VERDICT_MARK.readsBelowTrue}” or “{VERDICT_MARK.readsTooHigh}” are ones {R39_SOURCE} forbids: a speedometer must never show less than
          the true speed, nor more than 110 % of it plus 4 km/h. A change of size that gives them may need the speedometer recalibrated.
        </p>
      ) : null}
    </section>
  );
}
