"use client";

import { useId, useState } from "react";
import type { FinderQuery } from "@/lib/finder/finder-query";
import { activeFilterCount, setSizeOf } from "@/lib/finder/finder-state";
import { formatCount } from "@/lib/format/format";
import { centsToDollarsText, parseDollars } from "@/lib/money/money";
import { WEAR_SORT } from "@/lib/finder/finder-wear";
import { DEFAULT_SET_SIZE, FINDER_SORTS, SEASONS, SET_SIZE_CHOICES, TERRAINS } from "@/lib/tire/vocabulary";

const setSizeLabels: Record<(typeof SET_SIZE_CHOICES)[number], string> = {
  1: "1 tire",
  2: "2 tires (one axle)",
  4: "4 tires (a set)",
  6: "6 tires (rear duals)",
};

const sortLabels: Record<NonNullable<FinderQuery["sort"]>, string> = {
  diameter: "Closest diameter",
  price: "Lowest price",
  loadMargin: "Most load to spare",
  [WEAR_SORT]: "No shaving needed",
};

interface FinderFiltersProps {
  query: FinderQuery;
  brands: string[];
  defaultTolerancePct: number;
  onChange: (patch: Partial<FinderQuery>) => void;
}

/** The wear sort is offered once the tires that stay are being judged. */
const sortChoices = (query: FinderQuery): NonNullable<FinderQuery["sort"]>[] => (query.awd ? [...FINDER_SORTS, WEAR_SORT] : [...FINDER_SORTS]);

const select = "min-h-11 w-full rounded border border-rule bg-sheet px-2 text-ink";

const typedCents = (value: string): number | undefined => parseDollars(value) ?? undefined;

/**
 * Filters and sort; every change lands in the address so a reload or a pasted link shows the same list.
 * Below lg they fold away behind one button, so the results start near the top of a phone's screen.
 */
export function FinderFilters({ query, brands, defaultTolerancePct, onChange }: FinderFiltersProps) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const tolerance = query.tolerancePct ?? defaultTolerancePct;
  const needed = setSizeOf(query);
  const active = activeFilterCount(query);
  return (
    <div className="flex flex-col gap-2">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((value) => !value)}
        className="flex min-h-11 items-center justify-between gap-3 rounded border border-rule bg-sheet px-4 text-left font-semibold text-accent lg:hidden"
      >
        <span>
          Filter and sort
          {active > 0 ? <span className="font-normal text-ink"> ({formatCount(active)} on)</span> : null}
        </span>
        <span aria-hidden="true" className="font-mono text-xl">
          {open ? "−" : "+"}
        </span>
      </button>
      <fieldset id={panelId} className={`${open ? "grid" : "hidden lg:grid"} grid-cols-2 gap-3 rounded border border-rule bg-sheet p-4 text-sm sm:grid-cols-3 lg:grid-cols-4`}>
        <legend className="px-1 font-semibold max-lg:sr-only">Filter and sort</legend>
        <label className="flex flex-col gap-1">
          Tires needed
          <select
            className={select}
            value={needed}
            onChange={(event) => {
              const quantity = Number(event.target.value);
              onChange({ quantity: quantity === DEFAULT_SET_SIZE ? undefined : quantity });
            }}
          >
            {SET_SIZE_CHOICES.map((count) => (
              <option key={count} value={count}>
                {setSizeLabels[count]}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          Sort by
          <select className={select} value={query.sort ?? "diameter"} onChange={(event) => onChange({ sort: event.target.value as FinderQuery["sort"] })}>
            {sortChoices(query).map((sort) => (
              <option key={sort} value={sort}>
                {sortLabels[sort]}
              </option>
            ))}
          </select>
        </label>
        <ChoiceSelect label="Season" value={query.season} choices={SEASONS} onChange={(season) => onChange({ season: season as FinderQuery["season"] })} />
        <ChoiceSelect label="Terrain" value={query.terrain} choices={TERRAINS} onChange={(terrain) => onChange({ terrain: terrain as FinderQuery["terrain"] })} />
        <ChoiceSelect label="Brand" value={query.brand} choices={brands} onChange={(brand) => onChange({ brand })} />
        <label className="flex flex-col gap-1">
          Lowest price ($)
          <input type="text" inputMode="decimal" autoComplete="off" placeholder="any" className={select} defaultValue={query.minPriceCents === undefined ? "" : centsToDollarsText(query.minPriceCents)} onBlur={(event) => onChange({ minPriceCents: typedCents(event.target.value) })} />
        </label>
        <label className="flex flex-col gap-1">
          Highest price ($)
          <input type="text" inputMode="decimal" autoComplete="off" placeholder="any" className={select} defaultValue={query.maxPriceCents === undefined ? "" : centsToDollarsText(query.maxPriceCents)} onBlur={(event) => onChange({ maxPriceCents: typedCents(event.target.value) })} />
        </label>
        <label className="col-span-2 flex flex-col gap-1">
          Diameter tolerance: ±{tolerance} %
          <input type="range" min={1} max={5} step={0.5} value={tolerance} onChange={(event) => onChange({ tolerancePct: Number(event.target.value) })} className="min-h-11 accent-[var(--color-accent)]" />
        </label>
        <div className="col-span-2 flex flex-wrap gap-x-5 gap-y-1 sm:col-span-1 lg:col-span-2">
          <label className="inline-flex min-h-11 items-center gap-2">
            <input type="checkbox" checked={query.inStock !== undefined} onChange={(event) => onChange({ inStock: event.target.checked ? "1" : undefined })} className="size-5 accent-[var(--color-accent)]" />
            At least {needed} on hand
          </label>
          <label className="inline-flex min-h-11 items-center gap-2">
            <input type="checkbox" checked={query.threePeak !== undefined} onChange={(event) => onChange({ threePeak: event.target.checked ? "1" : undefined })} className="size-5 accent-[var(--color-accent)]" />
            Snowflake (3PMSF) only
          </label>
        </div>
      </fieldset>
    </div>
  );
}

interface ChoiceSelectProps {
  label: string;
  value: string | undefined;
  choices: readonly string[];
  onChange: (value: string | undefined) => void;
}

/** A filter with "Any" first; choosing "Any" removes the filter. */
function ChoiceSelect({ label, value, choices, onChange }: ChoiceSelectProps) {
  return (
    <label className="flex flex-col gap-1">
      {label}
      <select className={select} value={value ?? ""} onChange={(event) => onChange(event.target.value || undefined)}>
        <option value="">Any</option>
        {choices.map((choice) => (
          <option key={choice} value={choice}>
            {choice}
          </option>
        ))}
      </select>
    </label>
  );
}
