"use client";

import type { FinderQuery } from "@/lib/finder/finder-query";
import type { PlacardCheck } from "@/lib/tire";

interface PlacardFormProps {
  query: FinderQuery;
  check: PlacardCheck | null;
  originalLoadIndex: number | undefined;
  /** The tire on the car is a passenger tire, which carries no dual rating. */
  passengerTire: boolean;
  onChange: (patch: Partial<FinderQuery>) => void;
}

const input = "min-h-11 w-full rounded border border-rule bg-sheet px-3 font-mono text-ink";

function readWeight(value: string): number | undefined {
  const weight = Number.parseFloat(value);
  return Number.isFinite(weight) && weight > 0 ? weight : undefined;
}

/** Axle ratings → the minimum load index per tire, with the arithmetic shown. */
export function PlacardForm({ query, check, originalLoadIndex, passengerTire, onChange }: PlacardFormProps) {
  const unit = query.gawrUnit ?? "lb";
  const raised = check?.minLoadIndex != null && originalLoadIndex !== undefined && check.minLoadIndex > originalLoadIndex;
  return (
    <details open={Boolean(query.gawrFront || query.gawrRear)} className="rounded border border-rule bg-sheet p-4 text-sm">
      <summary className="cursor-pointer font-semibold">Placard check: is the load index enough for the axles?</summary>
      <p className="mt-2 text-ink-soft">
        Enter the gross axle weight ratings (GAWR) from the vehicle&apos;s certification label, on the driver&apos;s door edge or door pillar. They
        are not on the tire placard.
      </p>
      <div className="mt-3 grid grid-cols-2 gap-3 sm:grid-cols-4">
        <label className="flex flex-col gap-1">
          Front GAWR ({unit})
          <input type="number" min={1} inputMode="decimal" className={input} defaultValue={query.gawrFront ?? ""} onChange={(event) => onChange({ gawrFront: readWeight(event.target.value) })} />
        </label>
        <label className="flex flex-col gap-1">
          Rear GAWR ({unit})
          <input type="number" min={1} inputMode="decimal" className={input} defaultValue={query.gawrRear ?? ""} onChange={(event) => onChange({ gawrRear: readWeight(event.target.value) })} />
        </label>
        <label className="flex flex-col gap-1">
          Unit on the label
          <select className={input} value={unit} onChange={(event) => onChange({ gawrUnit: event.target.value as "kg" | "lb" })}>
            <option value="lb">pounds (lb)</option>
            <option value="kg">kilograms (kg)</option>
          </select>
        </label>
        <label className="flex flex-col gap-1">
          Vehicle
          <select className={input} value={query.vehicle ?? "passenger-car"} onChange={(event) => onChange({ vehicle: event.target.value as FinderQuery["vehicle"] })}>
            <option value="passenger-car">Passenger car</option>
            <option value="mpv-truck-trailer">SUV / MPV, truck or trailer</option>
          </select>
        </label>
        <label className="col-span-2 inline-flex min-h-11 items-center gap-2">
          <input type="checkbox" checked={query.rearDuals !== undefined} onChange={(event) => onChange({ rearDuals: event.target.checked ? "1" : undefined })} className="size-5 accent-[var(--color-accent)]" />
          Dual wheels on the rear axle
        </label>
      </div>
      {check ? (
        <div className="mt-3" aria-live="polite">
          <ol className="list-decimal space-y-1 pl-5 font-mono text-xs sm:text-sm">
            {check.axles.flatMap((axle) => axle.steps).map((step) => (
              <li key={step}>{step}</li>
            ))}
          </ol>
          {check.minLoadIndex !== null ? (
            <p className={`mt-2 border-l-4 px-3 py-1 ${raised ? "border-accent bg-accent-soft" : "border-rule"}`}>
              {raised
                ? `The axles need load index ${check.minLoadIndex} or higher: the list below now starts there instead of at ${originalLoadIndex}.`
                : `The current tire's load index${originalLoadIndex === undefined ? "" : ` (${originalLoadIndex})`} already covers the axles.`}
            </p>
          ) : null}
          {check.minLoadIndexDual !== null ? (
            <p className="mt-2 border-l-4 border-accent bg-accent-soft px-3 py-1">
              {passengerTire
                ? `Passenger tires carry no dual rating and do not belong on dual wheels, so the list below offers none for the rear axle. Ask the shop for light-truck tires with a dual load index of ${check.minLoadIndexDual} or higher.`
                : `The dual-wheel axle needs a dual load index of ${check.minLoadIndexDual} or higher; tires without a dual rating are left out.`}
            </p>
          ) : null}
        </div>
      ) : null}
    </details>
  );
}
