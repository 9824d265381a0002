"use client";

import { useMemo } from "react";
import { DifferenceTable } from "@/components/compare/difference-table";
import { SpeedometerTable } from "@/components/compare/speedometer-table";
import { ScaledTireDrawing } from "@/components/diagram/scaled-tire-drawing";
import { UnitsToggle } from "@/components/units/units-toggle";
import { useUnitSystem } from "@/components/units/use-unit-system";
import { compareSizes } from "@/lib/tire/compare";
import { formatSize } from "@/lib/tire/format";
import { sizeGeometry, type MeasurableSize } from "@/lib/tire/geometry";

/**
 * The card's sizes drawn over each other to one scale, with their differences, read-only. The sizes
 * come read (`measurableSizeFromSlug`) by the server, so the page's scripts carry no marking reader.
 */
export function FitCardComparison({ sizes }: { sizes: MeasurableSize[] }) {
  const [units, setUnits] = useUnitSystem();
  const compared = useMemo(() => compareSizes(sizes), [sizes]);
  const tires = sizes.map((size, index) => ({ id: `${index}-${formatSize(size)}`, label: formatSize(size), ...sizeGeometry(size) }));
  if (tires.length === 0) return null;
  return (
    <div className="flex flex-col gap-4">
      <div className="flex justify-end print:hidden">
        <UnitsToggle units={units} onChange={setUnits} />
      </div>
      <figure className="rounded border border-rule bg-sheet p-3 sm:p-4 print:break-inside-avoid">
        <ScaledTireDrawing
          tires={tires}
          units={units}
          title={`${tires.map((tire) => tire.label).join(", ")} drawn over each other to one scale`}
          description={`The tire on the car, ${tires[0]!.label}, in solid lines; the other sizes dashed, dotted and dash-dotted, in the order listed.`}
        />
      </figure>
      {compared.length > 1 ? (
        <>
          <DifferenceTable sizes={compared} units={units} />
          <SpeedometerTable sizes={compared} units={units} />
        </>
      ) : null}
    </div>
  );
}
