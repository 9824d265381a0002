"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import type { DrawnTire } from "@/components/diagram/drawing-layout";
import type { Candidate, NearMiss } from "@/lib/finder/alternatives-response";
import { formatPrice } from "@/lib/money/money";
import { formatSignedPercent, type UnitSystem } from "@/lib/tire/display";
import { formatServiceDescription } from "@/lib/tire/format";
import type { CandidateWear } from "@/lib/tire/wear-match-candidate";
import { candidateWearWords } from "@/lib/tire/wear-match-words";
import { RuleNotes } from "@/components/ui/rule-notes";
import { EstimateBreakdown } from "@/components/ui/estimate-breakdown";
import { StockLine } from "@/components/ui/stock-line";

// Fetched the first time a visitor asks for a drawing.
const CandidateDrawing = dynamic(() => import("./candidate-drawing").then((module) => module.CandidateDrawing));

interface ResultCardProps {
  tire: Candidate | NearMiss;
  original: DrawnTire | null;
  units: UnitSystem;
  /** How many tires the driver needs. */
  needed: number;
  /** For qualifying tires: what picking it does, whether it is picked, and how to change that. */
  pick?: { label: string; picked: boolean; disabled: boolean; onChange: (picked: boolean) => void };
  /** Beside the tires that stay on an all-wheel-drive vehicle, when their depths are known. */
  wear?: CandidateWear;
}

const wearStyle = (wear: CandidateWear): string => {
  if (wear.kind !== "judged") return "border-rule";
  return { fitsAsIs: "border-accent", shave: "border-caution", replaceSet: "border-danger" }[wear.match.verdict];
};

/** One catalog tire: what it is, what it costs, whether it is here, and why it qualifies (or not). */
export function ResultCard({ tire, original, units, needed, pick, wear }: ResultCardProps) {
  const [drawing, setDrawing] = useState(false);
  const lines = "reasons" in tire ? tire.reasons : tire.failed;
  const badges = [tire.extraLoad ? "XL" : null, tire.runFlat ? "Run-flat" : null, tire.loadRange ? `Load range ${tire.loadRange}` : null, tire.threePeak ? "3PMSF" : null];
  return (
    <article className="rounded border border-rule bg-sheet p-4" data-sku={tire.sku}>
      {/* A fixed price column from sm up, so price and stock sit in one place on every card, whatever the stock words. */}
      <div className="grid gap-x-4 gap-y-1 sm:grid-cols-[minmax(0,1fr)_14rem]">
        <div className="min-w-0">
          <h3 className="font-semibold">
            {tire.brand} {tire.line}
          </h3>
          <p className="font-mono text-sm">
            {tire.designation} {formatServiceDescription(tire)}
            <span className="ml-2 text-ink-soft">({formatSignedPercent(tire.diameterDiffPct)} diameter)</span>
          </p>
          <p className="text-sm text-ink-soft">
            {tire.season} · {tire.terrain}
            {badges.filter(Boolean).map((badge) => ` · ${badge}`)}
          </p>
        </div>
        <div className="sm:text-right">
          <p className="text-lg font-semibold" data-price={tire.priceCents}>
            {formatPrice(tire.priceCents)} <span className="text-sm font-normal text-ink-soft">each</span>
          </p>
          <StockLine quantity={tire.quantity} needed={needed} />
        </div>
      </div>
      <ul className={`mt-2 grid gap-x-4 text-sm sm:grid-cols-2 ${"reasons" in tire ? "" : "text-danger"}`}>
        {lines.map((line) => (
          <li key={line} className="flex gap-1.5">
            <span aria-hidden="true">{"reasons" in tire ? "✓" : "✗"}</span>
            {line}
          </li>
        ))}
      </ul>
      {wear ? (
        <p className={`mt-2 border-l-4 pl-3 text-sm ${wearStyle(wear)}`} data-wear={wear.kind === "judged" ? wear.match.verdict : wear.kind}>
          <span className="font-semibold">Tread depth: </span>
          {candidateWearWords(wear)}
        </p>
      ) : null}
      {"notes" in tire && tire.notes.length > 0 ? <RuleNotes notes={tire.notes} /> : null}
      {"estimate" in tire ? <EstimateBreakdown estimate={tire.estimate} className="mt-3 sm:max-w-sm" /> : null}
      {pick ? (
        <label className="mt-2 flex min-h-11 items-center gap-2 text-sm font-semibold">
          <input type="checkbox" checked={pick.picked} disabled={pick.disabled && !pick.picked} onChange={(event) => pick.onChange(event.target.checked)} className="size-5 accent-accent" />
          <span>
            {pick.label}
            <span className="sr-only">
              {" "}
              ({tire.brand} {tire.line} {tire.designation} {formatServiceDescription(tire)})
            </span>
          </span>
        </label>
      ) : null}
      {original ? (
        <button type="button" aria-expanded={drawing} onClick={() => setDrawing(!drawing)} className="mt-2 min-h-11 text-sm font-semibold text-accent underline underline-offset-4">
          {drawing ? "Hide the drawing" : "Draw it against the current tire"}
        </button>
      ) : null}
      {original && drawing ? <CandidateDrawing original={original} designation={tire.designation} diameterDiffPct={tire.diameterDiffPct} units={units} /> : null}
    </article>
  );
}
