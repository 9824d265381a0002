import { formatDepth32, formatDepth32Short, formatWornLength, shaveDepthToShow, type TireOnVehicle, type WearMatch, wornTire } from "@/lib/tire";

// A generic vehicle's track and wheelbase (mm): only where the tires sit, not any vehicle's figures.
const TRACK_MM = 1600;
const WHEELBASE_MM = 2700;
const MARGIN_MM = 260;
const NEW_TIRE_GAP_MM = 900;

type Corner = "front left" | "front right" | "rear left" | "rear right";
const CORNERS: readonly Corner[] = ["front left", "front right", "rear left", "rear right"];

interface PlacedTire {
  corner: Corner;
  tire: TireOnVehicle;
  isNew: boolean;
}

/** The new tire as it goes on: shaved to the depth shown, when shaving is the answer. */
export function fittedTire(match: WearMatch): TireOnVehicle {
  const shaved = shaveDepthToShow(match);
  return shaved === null ? match.newTire : wornTire(match.newTire.overallDiameterMm, match.newTire.depth32, shaved);
}

/**
 * The tires that stay fill the corners from the front; the new ones take the rest, so two new tires
 * sit on the rear axle (common practice) and one takes the rear right, standing for whichever is worn out.
 */
export function placeTires(match: WearMatch): PlacedTire[] {
  const staying = match.remaining.map((tire, index) => ({ corner: CORNERS[index]!, tire, isNew: false }));
  const fresh = CORNERS.slice(staying.length).map((corner) => ({ corner, tire: fittedTire(match), isNew: true }));
  return [...staying, ...fresh];
}

/** The four corners drawn to scale from above (a tire seen from above is its width by its diameter), and the new tire beside them. */
export function VehicleFromAbove({ match, sectionWidthMm, description }: { match: WearMatch; sectionWidthMm: number; description: string }) {
  const placed = placeTires(match);
  const length = match.newTire.overallDiameterMm;
  const width = sectionWidthMm;
  const viewWidth = MARGIN_MM * 2 + TRACK_MM + width + NEW_TIRE_GAP_MM + width;
  const viewHeight = MARGIN_MM * 2 + WHEELBASE_MM + length;
  const x = (corner: Corner) => MARGIN_MM + (corner.endsWith("right") ? TRACK_MM : 0);
  const y = (corner: Corner) => MARGIN_MM + (corner.startsWith("rear") ? WHEELBASE_MM : 0);
  const newX = MARGIN_MM + TRACK_MM + width + NEW_TIRE_GAP_MM;
  const newY = MARGIN_MM + WHEELBASE_MM / 2;
  return (
    <figure className="rounded border border-rule bg-sheet p-3">
      <svg viewBox={`0 0 ${viewWidth} ${viewHeight}`} role="img" aria-labelledby="vehicle-title vehicle-desc" className="mx-auto block h-auto w-full max-w-xs sm:max-w-md">
        <title id="vehicle-title">The vehicle from above, tires to scale</title>
        <desc id="vehicle-desc">{description}</desc>
        <rect
          x={MARGIN_MM + width / 2 - 120}
          y={MARGIN_MM - 200}
          width={TRACK_MM + 240}
          height={WHEELBASE_MM + length + 400}
          rx={420}
          className="fill-paper stroke-rule"
          strokeWidth={16}
        />
        <text x={MARGIN_MM + width / 2 + TRACK_MM / 2} y={MARGIN_MM - 60} textAnchor="middle" className="fill-ink-soft" fontSize={110}>
          front
        </text>
        {placed.map(({ corner, tire, isNew }) => (
          <g key={corner}>
            <rect x={x(corner)} y={y(corner)} width={width} height={tire.overallDiameterMm} rx={60} className={isNew ? "fill-accent" : "fill-ink"} />
            <text
              x={corner.endsWith("right") ? x(corner) - 50 : x(corner) + width + 50}
              y={y(corner) + length / 2}
              textAnchor={corner.endsWith("right") ? "end" : "start"}
              className="fill-ink"
              fontSize={120}
            >
              <tspan x={corner.endsWith("right") ? x(corner) - 50 : x(corner) + width + 50}>{isNew ? "new" : "stays"}</tspan>
              <tspan x={corner.endsWith("right") ? x(corner) - 50 : x(corner) + width + 50} dy={150}>
                {formatDepth32Short(tire.depth32)}
              </tspan>
            </text>
          </g>
        ))}
        <rect x={newX} y={newY} width={width} height={length} rx={60} className="fill-accent" />
        <text x={newX + width / 2} y={newY - 60} textAnchor="middle" className="fill-ink" fontSize={120}>
          {`new, ${formatDepth32Short(match.newTire.depth32)}`}
        </text>
      </svg>
      <figcaption className="mt-2 text-sm text-ink-soft">
        To scale from above: {placed.map(({ corner, tire, isNew }) => `${corner} ${isNew ? "new" : "stays"}, ${formatDepth32(tire.depth32)}, ⌀ ${formatWornLength(tire.overallDiameterMm)}`).join("; ")}.
        A few millimetres of diameter hardly show at this scale; the table below gives every figure.
      </figcaption>
    </figure>
  );
}
