/**
 * Where each view of a tire drawing sits, in millimetres: the drawing's user units are millimetres,
 * so every shape is exactly to scale and sizes drawn together share one scale.
 */
export interface DrawnTire {
  id: string;
  label: string;
  overallDiameterMm: number;
  rimDiameterMm: number;
  sectionWidthMm: number;
  sidewallMm: number;
}

/** "row": cross-section beside the side view, level with it (wide screens); "column": below it (phones). */
export type DrawingArrangement = "row" | "column";

export interface DrawingLayout {
  arrangement: DrawingArrangement;
  width: number;
  height: number;
  /** Centre of the side view. */
  cx: number;
  cy: number;
  /** The side view's frame: a round size at least as large as the largest tire, so growth is visible. */
  frame: number;
  fontSize: number;
  /** Left edge of each tire's cross-section. */
  sectionX: (tire: DrawnTire) => number;
  /** Top of each tire's cross-section: level with the side view's top in a row, one shared line in a column. */
  sectionTop: (tire: DrawnTire) => number;
  scaleBar: { x: number; y: number };
}

const FRAME_STEP_MM = 100;
const MIN_FRAME_MM = 700;

export function layoutDrawing(tires: readonly DrawnTire[], arrangement: DrawingArrangement): DrawingLayout {
  const largest = Math.max(MIN_FRAME_MM, ...tires.map((tire) => tire.overallDiameterMm));
  const widest = Math.max(250, ...tires.map((tire) => tire.sectionWidthMm));
  const tallest = Math.max(...tires.map((tire) => tire.sidewallMm), 100);
  const frame = Math.ceil(largest / FRAME_STEP_MM) * FRAME_STEP_MM;

  if (arrangement === "row") {
    const fontSize = frame * 0.045;
    const margin = fontSize * 2.6;
    const cx = margin + frame / 2;
    const cy = margin + frame / 2;
    const left = margin + frame + fontSize * 6.5;
    return {
      arrangement,
      width: left + widest + fontSize * 7,
      height: frame + margin * 2,
      cx,
      cy,
      frame,
      fontSize,
      sectionX: () => left,
      sectionTop: (tire) => cy - tire.overallDiameterMm / 2,
      scaleBar: { x: left, y: frame + margin * 2 - fontSize * 1.6 },
    };
  }

  const fontSize = frame * 0.06;
  const margin = fontSize * 1.5;
  const cx = margin + frame / 2;
  const cy = margin + frame / 2;
  const top = margin * 2 + frame + fontSize * 2.2;
  return {
    arrangement,
    width: margin + frame + fontSize * 6.2,
    height: top + tallest + fontSize * 3.6,
    cx,
    cy,
    frame,
    fontSize,
    sectionX: (tire) => cx - tire.sectionWidthMm / 2,
    sectionTop: () => top,
    scaleBar: { x: margin, y: top + tallest + fontSize * 2.2 },
  };
}

/** Line styles that tell sizes apart without colour: solid, dashed, dotted, dash-dot. */
export const tireLineStyles = ["none", "18 10", "4 8", "22 8 4 8"] as const;
