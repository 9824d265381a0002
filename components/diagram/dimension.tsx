import { useDrawingKit } from "./drawing-kit";

interface DimensionProps {
  markerId: string;
  part: string;
  orientation: "horizontal" | "vertical";
  /** The fixed coordinate: y of a horizontal line, x of a vertical one. */
  at: number;
  from: number;
  to: number;
  label: string;
  fontSize: number;
  color: string;
}

/** A dimension line with arrowheads at both ends and its measurement written alongside. */
export function Dimension({ markerId, part, orientation, at, from, to, label, fontSize, color }: DimensionProps) {
  const horizontal = orientation === "horizontal";
  const middle = (from + to) / 2;
  const line = horizontal ? { x1: from, y1: at, x2: to, y2: at } : { x1: at, y1: from, x2: at, y2: to };
  const labelAt = horizontal ? { x: middle, y: at - fontSize * 0.45 } : { x: at + fontSize * 0.45, y: middle };
  const arrowSize = fontSize * 0.5;
  const m = useDrawingKit();
  return (
    <g data-dimension={part} color={color} stroke="currentColor" fill="currentColor">
      <defs>
        <marker id={`${markerId}-${part}`} viewBox="0 0 10 10" refX="10" refY="5" markerWidth={arrowSize} markerHeight={arrowSize} markerUnits="userSpaceOnUse" orient="auto-start-reverse">
          <path d="M0 0L10 5L0 10z" stroke="none" />
        </marker>
      </defs>
      <m.line
        animate={line}
        strokeWidth={fontSize * 0.06}
        markerStart={`url(#${markerId}-${part})`}
        markerEnd={`url(#${markerId}-${part})`}
      />
      <m.text
        animate={{ attrX: labelAt.x, attrY: labelAt.y }}
        textAnchor={horizontal ? "middle" : "start"}
        dominantBaseline={horizontal ? "auto" : "middle"}
        stroke="none"
      >
        {label}
      </m.text>
    </g>
  );
}
