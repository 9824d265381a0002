"use client";

import { ScaledTireDrawing } from "@/components/diagram/scaled-tire-drawing";
import { drawingText, drawnTireOf } from "@/components/reader/drawn-tire";
import { UnitsToggle } from "@/components/units/units-toggle";
import { useUnitSystem } from "@/components/units/use-unit-system";
import type { Geometry, TireSize } from "@/lib/tire";

/** The Size sheet's drawing, labelled in the person's own units. */
export function SizeDrawing({ size, geometry }: { size: TireSize; geometry: Geometry }) {
  const [units, setUnits] = useUnitSystem();
  return (
    <div className="flex flex-col gap-3">
      <div className="flex justify-end">
        <UnitsToggle units={units} onChange={setUnits} />
      </div>
      <ScaledTireDrawing tires={[drawnTireOf(size, geometry)]} units={units} {...drawingText(size, geometry, units)} />
    </div>
  );
}
