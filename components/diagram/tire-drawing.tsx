"use client";

import { useId } from "react";
import { formatLength, type UnitSystem } from "@/lib/tire/display";
import { Dimension } from "./dimension";
import { useDrawingKit, useMotionOnFirstInput } from "./drawing-kit";
import { type DrawingArrangement, type DrawnTire, layoutDrawing, tireLineStyles } from "./drawing-layout";

export type DrawingPart = "overall" | "rim" | "sectionWidth" | "sidewall";

interface TireDrawingProps {
  tires: readonly DrawnTire[];
  units: UnitSystem;
  title: string;
  description: string;
  arrangement: DrawingArrangement;
  highlight?: DrawingPart | null;
  className?: string;
}

/** Side view and cross-section of one to four tires, drawn in millimetres to one scale. */
export function TireDrawing({ tires, units, title, description, arrangement, highlight = null, className }: TireDrawingProps) {
  const id = useId();
  const layout = layoutDrawing(tires, arrangement);
  const { cx, cy, fontSize } = layout;
  const reference = tires[0];
  const tone = (part: DrawingPart) => (highlight === part ? "var(--color-accent)" : "currentColor");
  const strokeWidth = fontSize * 0.1;
  const m = useDrawingKit();
  useMotionOnFirstInput();

  return (
    <m.Frame>
      <m.svg
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        data-arrangement={arrangement}
        viewBox={`0 0 ${layout.width} ${layout.height}`}
        animate={{ viewBox: `0 0 ${layout.width} ${layout.height}` }}
        className={`h-auto w-full text-ink ${className ?? ""}`}
        fontFamily="var(--font-mono)"
        fontSize={fontSize}
      >
        <title id={`${id}-title`}>{title}</title>
        <desc id={`${id}-desc`}>{description}</desc>
        <line x1={cx} y1={cy - layout.frame / 2} x2={cx} y2={cy + layout.frame / 2} stroke="currentColor" strokeOpacity={0.35} strokeWidth={strokeWidth * 0.5} strokeDasharray="24 6 4 6" />
        {tires.map((tire, index) => (
          <TireOutline key={tire.id} tire={tire} index={index} layout={layout} strokeWidth={strokeWidth} highlight={index === 0 ? highlight : null} />
        ))}
        {reference ? (
          <g>
            <m.rect
              animate={{
                attrX: layout.sectionX(reference) + reference.sectionWidthMm * 0.125,
                attrY: layout.sectionTop(reference) + reference.sidewallMm,
                width: reference.sectionWidthMm * 0.75,
                height: fontSize * 0.5,
              }}
              fill="currentColor"
              fillOpacity={0.45}
            />
            {arrangement === "row" ? (
              <ProjectionLines cx={cx} sectionX={layout.sectionX(reference)} ys={[cy - reference.overallDiameterMm / 2, cy - reference.rimDiameterMm / 2]} strokeWidth={strokeWidth * 0.5} />
            ) : null}
            <Dimension markerId={`${id}-arrow`} part="overall" orientation="vertical" at={cx + layout.frame / 2 + fontSize * 1.2} from={cy - reference.overallDiameterMm / 2} to={cy + reference.overallDiameterMm / 2} label={formatLength(reference.overallDiameterMm, units)} fontSize={fontSize} color={tone("overall")} />
            <Dimension markerId={`${id}-arrow`} part="rim" orientation="horizontal" at={cy} from={cx - reference.rimDiameterMm / 2} to={cx + reference.rimDiameterMm / 2} label={formatLength(reference.rimDiameterMm, units)} fontSize={fontSize} color={tone("rim")} />
            <Dimension markerId={`${id}-arrow`} part="sectionWidth" orientation="horizontal" at={layout.sectionTop(reference) - fontSize * 1.2} from={layout.sectionX(reference)} to={layout.sectionX(reference) + reference.sectionWidthMm} label={formatLength(reference.sectionWidthMm, units)} fontSize={fontSize} color={tone("sectionWidth")} />
            <Dimension markerId={`${id}-arrow`} part="sidewall" orientation="vertical" at={layout.sectionX(reference) + reference.sectionWidthMm + fontSize * 1.2} from={layout.sectionTop(reference)} to={layout.sectionTop(reference) + reference.sidewallMm} label={formatLength(reference.sidewallMm, units)} fontSize={fontSize} color={tone("sidewall")} />
            <ScaleBar x={layout.scaleBar.x} y={layout.scaleBar.y} units={units} fontSize={fontSize} strokeWidth={strokeWidth} />
          </g>
        ) : null}
      </m.svg>
    </m.Frame>
  );
}

interface TireOutlineProps {
  tire: DrawnTire;
  index: number;
  layout: ReturnType<typeof layoutDrawing>;
  strokeWidth: number;
  highlight: DrawingPart | null;
}

function TireOutline({ tire, index, layout, strokeWidth, highlight }: TireOutlineProps) {
  const dash = tireLineStyles[index % tireLineStyles.length];
  const primary = index === 0;
  const tone = (...parts: DrawingPart[]) => (highlight && parts.includes(highlight) ? "var(--color-accent)" : "currentColor");
  const fill = primary ? { fill: "var(--color-ink)", fillOpacity: 0.14 } : { fill: "none" };
  const weight = strokeWidth * (primary ? 1.6 : 1.2);
  const m = useDrawingKit();
  return (
    <g data-tire={tire.id} strokeDasharray={dash === "none" ? undefined : dash}>
      <m.circle data-part="overall" cx={layout.cx} cy={layout.cy} animate={{ r: tire.overallDiameterMm / 2 }} {...fill} stroke={tone("overall")} strokeWidth={weight} />
      <m.circle data-part="rim" cx={layout.cx} cy={layout.cy} animate={{ r: tire.rimDiameterMm / 2 }} fill={primary ? "var(--color-sheet)" : "none"} stroke={tone("rim")} strokeWidth={strokeWidth} />
      <m.rect
        data-part="section"
        animate={{
          attrX: layout.sectionX(tire),
          attrY: layout.sectionTop(tire),
          width: tire.sectionWidthMm,
          height: tire.sidewallMm,
          rx: Math.min(tire.sectionWidthMm, tire.sidewallMm) * 0.28,
        }}
        {...fill}
        stroke={tone("sectionWidth", "sidewall")}
        strokeWidth={weight}
      />
    </g>
  );
}

function ProjectionLines({ cx, sectionX, ys, strokeWidth }: { cx: number; sectionX: number; ys: number[]; strokeWidth: number }) {
  const m = useDrawingKit();
  return (
    <g stroke="currentColor" strokeOpacity={0.4} strokeWidth={strokeWidth} strokeDasharray="6 6">
      {ys.map((y, index) => (
        <m.line key={index} animate={{ x1: cx, y1: y, x2: sectionX, y2: y }} />
      ))}
    </g>
  );
}

function ScaleBar({ x, y, units, fontSize, strokeWidth }: { x: number; y: number; units: UnitSystem; fontSize: number; strokeWidth: number }) {
  const lengthMm = units === "metric" ? 100 : 101.6;
  return (
    <g data-part="scale-bar">
      <rect x={x} y={y} width={lengthMm} height={fontSize * 0.3} fill="currentColor" />
      <rect x={x} y={y} width={lengthMm / 2} height={fontSize * 0.3} fill="var(--color-sheet)" stroke="currentColor" strokeWidth={strokeWidth * 0.5} />
      <text x={x + lengthMm + fontSize * 0.4} y={y + fontSize * 0.3} dominantBaseline="middle" fill="currentColor">
        {units === "metric" ? "100 mm" : "4 in"}
      </text>
    </g>
  );
}
