"use client";

import { ScaledTireDrawing } from "@/components/diagram/scaled-tire-drawing";
import type { DrawnTire } from "@/components/diagram/drawing-layout";
import { drawnTireOf } from "@/components/reader/drawn-tire";
import { formatSignedPercent, type UnitSystem } from "@/lib/tire/display";
import { parseMarking } from "@/lib/tire/parse/parse-marking";

interface CandidateDrawingProps {
  original: DrawnTire;
  designation: string;
  diameterDiffPct: number;
  units: UnitSystem;
}

/** A result drawn over the current tire; fetched when asked for, as it carries the marking reader. */
export function CandidateDrawing({ original, designation, diameterDiffPct, units }: CandidateDrawingProps) {
  const marking = parseMarking(designation);
  if (!marking.ok || !marking.size || !marking.geometry) return null;
  const candidate = drawnTireOf(marking.size, marking.geometry);
  return (
    <div className="mt-2">
      <ScaledTireDrawing
        tires={[original, { ...candidate, id: `${candidate.id}-candidate` }]}
        units={units}
        title={`${original.label} and ${candidate.label} drawn to one scale`}
        description={`The current tire in solid lines, ${candidate.label} dashed; its overall diameter differs by ${formatSignedPercent(diameterDiffPct)}.`}
      />
    </div>
  );
}
