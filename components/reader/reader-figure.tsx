import { TireDrawing, type DrawingPart } from "@/components/diagram/tire-drawing";
import type { UnitSystem } from "@/lib/tire/display";
import type { Geometry, TireSize } from "@/lib/tire";
import { drawingText, drawnTireOf } from "./drawn-tire";
import { MeasurementsTable } from "./measurements-table";

interface ReaderFigureProps {
  size: TireSize;
  geometry: Geometry;
  units: UnitSystem;
  highlight: DrawingPart | null;
}

/** The scaled drawing (stacked on phones, side by side on wider screens) and its table of numbers. */
export function ReaderFigure({ size, geometry, units, highlight }: ReaderFigureProps) {
  const tires = [drawnTireOf(size, geometry)];
  const text = drawingText(size, geometry, units);
  return (
    <figure className="rounded border border-rule bg-sheet p-3 sm:p-4">
      <TireDrawing tires={tires} units={units} highlight={highlight} arrangement="column" className="sm:hidden" {...text} />
      <TireDrawing tires={tires} units={units} highlight={highlight} arrangement="row" className="hidden sm:block" {...text} />
      <figcaption className="mt-3">
        <MeasurementsTable geometry={geometry} units={units} caption="Drawn to scale · nominal, new and unloaded" />
      </figcaption>
    </figure>
  );
}
