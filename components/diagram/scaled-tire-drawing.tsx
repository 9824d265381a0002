import type { UnitSystem } from "@/lib/tire";
import type { DrawnTire } from "./drawing-layout";
import { type DrawingPart, TireDrawing } from "./tire-drawing";

interface ScaledTireDrawingProps {
  tires: readonly DrawnTire[];
  units: UnitSystem;
  title: string;
  description: string;
  highlight?: DrawingPart | null;
}

/** The drawing stacked for phones and side by side for wider screens; only one is ever displayed. */
export function ScaledTireDrawing(props: ScaledTireDrawingProps) {
  return (
    <>
      <TireDrawing {...props} arrangement="column" className="sm:hidden" />
      <TireDrawing {...props} arrangement="row" className="hidden sm:block" />
    </>
  );
}
