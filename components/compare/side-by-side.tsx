"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { ScaledTireDrawing } from "@/components/diagram/scaled-tire-drawing";
import { SaveFitCard } from "@/components/fit-card/save-fit-card-button";
import { AskTheShop } from "@/components/quotes/ask-the-shop";
import { UnitsToggle } from "@/components/units/units-toggle";
import { useUnitSystem } from "@/components/units/use-unit-system";
import { compareSizes } from "@/lib/tire/compare";
import { formatSize, sizeToSlug } from "@/lib/tire/format";
import { sizeGeometry, type MeasurableSize } from "@/lib/tire/geometry";
import { useOnDemand } from "@/components/reader/use-on-demand";
import { DifferenceTable } from "./difference-table";
import type { SizeEntry } from "./size-entry";
import { SizeListEditor } from "./size-list-editor";
import { SpeedometerSummary } from "./speedometer-summary";
import { SpeedometerTable } from "./speedometer-table";

const fetchSizeReader = () => import("./size-entry");

/**
 * Up to four sizes drawn over each other to one scale, with their differences and the speedometer.
 * The sizes in the address come read by the server; the reader for typed ones is fetched at the first
 * focus or edit, and what was typed before it arrives is read then.
 */
export function SideBySide({ initialEntries }: { initialEntries: SizeEntry[] }) {
  const [typed, setTyped] = useState(initialEntries);
  const nextId = useRef(typed.length);
  const [units, setUnits] = useUnitSystem();
  const [reader, loadReader] = useOnDemand(fetchSizeReader);
  // Until the reader arrives, an edited entry keeps its last reading for a moment.
  const entries = useMemo(() => (reader ? typed.map((entry) => reader.readSizeEntry(entry.text, entry.id)) : typed), [reader, typed]);
  const sizes = useMemo(() => entries.map((entry) => entry.size).filter((size): size is MeasurableSize => size !== null), [entries]);
  const compared = useMemo(() => compareSizes(sizes), [sizes]);

  useEffect(() => {
    const url = new URL(window.location.href);
    if (sizes.length > 0) url.searchParams.set("sizes", sizes.map(sizeToSlug).join(","));
    else url.searchParams.delete("sizes");
    window.history.replaceState(window.history.state, "", url);
  }, [sizes]);

  const change = (id: number, text: string) => {
    loadReader();
    setTyped((list) => list.map((entry) => (entry.id === id ? { ...entry, text } : entry)));
  };
  const remove = (id: number) => setTyped((list) => list.filter((entry) => entry.id !== id));
  const add = () => setTyped((list) => [...list, { id: nextId.current++, text: "", problem: null, size: null }]);
  const move = (id: number, offset: -1 | 1) =>
    setTyped((list) => {
      const from = list.findIndex((entry) => entry.id === id);
      const to = from + offset;
      if (from < 0 || to < 0 || to >= list.length) return list;
      const next = [...list];
      [next[from], next[to]] = [next[to]!, next[from]!];
      return next;
    });

  const tires = sizes.map((size, index) => {
    const geometry = sizeGeometry(size);
    return { id: `${index}-${formatSize(size)}`, label: formatSize(size), ...geometry };
  });
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.2fr)] lg:gap-10">
      <div className="flex min-w-0 flex-col gap-4" onFocus={loadReader}>
        <SizeListEditor entries={entries} onChange={change} onRemove={remove} onMove={move} onAdd={add} />
        <div className="flex justify-end">
          <UnitsToggle units={units} onChange={setUnits} />
        </div>
      </div>
      <div className="flex min-w-0 flex-col gap-6">
        {tires.length > 0 ? (
          <figure className="rounded border border-rule bg-sheet p-3 sm:p-4">
            <ScaledTireDrawing
              tires={tires}
              units={units}
              title={`${tires.map((tire) => tire.label).join(", ")} drawn over each other to one scale`}
              description={`The reference ${tires[0]!.label} in solid lines; the other sizes dashed, dotted and dash-dotted, in the order listed.`}
            />
          </figure>
        ) : (
          <p className="rounded border border-dashed border-rule p-6 text-ink-soft">Type a size to see it drawn.</p>
        )}
        {compared.length > 1 ? (
          <>
            <SpeedometerSummary sizes={compared} units={units} />
            <DifferenceTable sizes={compared} units={units} />
            <SpeedometerTable sizes={compared} units={units} />
          </>
        ) : tires.length === 1 ? (
          <p className="text-ink-soft">Add a second size to compare it with {tires[0]!.label}.</p>
        ) : null}
        {tires.length > 0 ? (
          <>
            <SaveFitCard draft={{ sizes: tires.map((tire) => tire.label) }} />
            <AskTheShop source="compare" reference={sizes.map(sizeToSlug).join(",")} tires={tires.map((tire) => tire.label).join(", ")} />
          </>
        ) : null}
      </div>
    </div>
  );
}
