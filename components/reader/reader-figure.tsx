import { ScaledTireDrawing } from "@/components/diagram/scaled-tire-drawing";
import type { DrawingPart } from "@/components/diagram/tire-drawing";
import type { Geometry, TireSize, UnitSystem } from "@/lib/tire";
import { drawingText, drawnTireOf } from "./drawn-tire";
import { MeasurementsTable } from "./measurements-table";

interface ReaderFigureProps {
  size: TireSize;
  geometry: Geometry;
  units: UnitSystem;
  highlight: DrawingPart | null;
}

/** The scaled drawing and its table of numbers. */
export function ReaderFigure({ size, geometry, units, highlight }: ReaderFigureProps) {
  return (
    <figure className="rounded border border-rule bg-sheet p-3 sm:p-4">
      <ScaledTireDrawing tires={[drawnTireOf(size, geometry)]} units={units} highlight={highlight} {...drawingText(size, geometry, units)} />
      <figcaption className="mt-3">
        <MeasurementsTable geometry={geometry} unitSystems={[units]} caption="Drawn to scale · nominal, new and unloaded" />
      </figcaption>
    </figure>
  );
}
