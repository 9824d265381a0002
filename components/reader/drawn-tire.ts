import type { DrawnTire } from "@/components/diagram/drawing-layout";
import { formatLength, type UnitSystem } from "@/lib/tire/display";
import { formatSize } from "@/lib/tire/format";
import { type Geometry } from "@/lib/tire/geometry";
import { type TireSize } from "@/lib/tire/types";

export function drawnTireOf(size: TireSize, geometry: Geometry): DrawnTire {
  const label = formatSize(size);
  return {
    id: label,
    label,
    overallDiameterMm: geometry.overallDiameterMm,
    rimDiameterMm: geometry.rimDiameterMm,
    sectionWidthMm: geometry.sectionWidthMm,
    sidewallMm: geometry.sidewallMm,
  };
}

/** The drawing's title and description, for people who cannot see it. */
export function drawingText(size: TireSize, geometry: Geometry, units: UnitSystem) {
  const label = formatSize(size);
  return {
    title: `${label} drawn to scale`,
    description:
      `Side view and cross-section of a ${label} tire: overall diameter ${formatLength(geometry.overallDiameterMm, units)}, ` +
      `rim diameter ${formatLength(geometry.rimDiameterMm, units)}, section width ${formatLength(geometry.sectionWidthMm, units)}, ` +
      `sidewall height ${formatLength(geometry.sidewallMm, units)}.`,
  };
}
