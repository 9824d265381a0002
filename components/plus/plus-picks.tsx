"use client";

import { createContext, useContext, useState, type ReactNode } from "react";
import { SaveFitCard } from "@/components/fit-card/save-fit-card-button";
import { MAX_COMPARED_SIZES } from "@/lib/compare/read-sizes";

const MAX_PICKS = MAX_COMPARED_SIZES - 1;

const PicksContext = createContext<{ picks: string[]; toggle: (designation: string, on: boolean) => void }>({ picks: [], toggle: () => undefined });

/** Holds the plus sizes picked for a Fit card, for the checkboxes in the tables and the save form below them. */
export function PlusPicks({ children }: { children: ReactNode }) {
  const [picks, setPicks] = useState<string[]>([]);
  const toggle = (designation: string, on: boolean) => setPicks((list) => (on ? [...list, designation] : list.filter((picked) => picked !== designation)));
  return <PicksContext value={{ picks, toggle }}>{children}</PicksContext>;
}

/** A size's checkbox: up to three sizes go on a card beside the current one. */
export function PickForCard({ designation }: { designation: string }) {
  const { picks, toggle } = useContext(PicksContext);
  const picked = picks.includes(designation);
  return (
    <label className="inline-flex min-h-11 min-w-11 items-center justify-center">
      <input type="checkbox" checked={picked} disabled={!picked && picks.length >= MAX_PICKS} onChange={(event) => toggle(designation, event.target.checked)} className="size-5 accent-accent" />
      <span className="sr-only">Put {designation} on a Fit card</span>
    </label>
  );
}

/** "Save as Fit card" for the current size and the picked ones. */
export function PlusSaveCard({ original, loadIndex, speedSymbol, tolerancePct }: { original: string; loadIndex?: number; speedSymbol?: string; tolerancePct: number }) {
  const { picks } = useContext(PicksContext);
  return (
    <div className="flex flex-col gap-2">
      <p className="text-ink-soft">
        {picks.length === 0 ? "Tick up to three sizes to put them on a Fit card beside the current one." : `On the card: ${[original, ...picks].join(", ")}.`}
      </p>
      <SaveFitCard draft={{ sizes: [original, ...picks], loadIndex, speedSymbol, tolerancePct }} />
    </div>
  );
}
