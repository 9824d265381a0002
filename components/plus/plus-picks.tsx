"use client";

import { createContext, useContext, useState, type ReactNode } from "react";
import { SaveFitCard } from "@/components/fit-card/save-fit-card-button";
import { AskTheShop } from "@/components/quotes/ask-the-shop";
import { plusQuoteTires } from "@/components/quotes/quote-tires";
import { MAX_COMPARED_SIZES } from "@/lib/compare/compare-limits";

const MAX_PICKS = MAX_COMPARED_SIZES - 1;

const PicksContext = createContext<{ picks: string[]; toggle: (designation: string, on: boolean) => void }>({ picks: [], toggle: () => undefined });

/** Holds the plus sizes picked in the tables, for the Fit card and the request to the shop below them. */
export function PlusPicks({ children }: { children: ReactNode }) {
  const [picks, setPicks] = useState<string[]>([]);
  const toggle = (designation: string, on: boolean) => setPicks((list) => (on ? [...list, designation] : list.filter((picked) => picked !== designation)));
  return <PicksContext value={{ picks, toggle }}>{children}</PicksContext>;
}

/** A size's checkbox: up to three sizes are picked to compare with the current one. */
export function PickSize({ designation }: { designation: string }) {
  const { picks, toggle } = useContext(PicksContext);
  const picked = picks.includes(designation);
  return (
    <label className="relative inline-flex min-h-11 min-w-11 items-center justify-center">
      <input type="checkbox" checked={picked} disabled={!picked && picks.length >= MAX_PICKS} onChange={(event) => toggle(designation, event.target.checked)} className="size-5 accent-accent" />
      <span className="sr-only">Pick {designation} to compare and ask about</span>
    </label>
  );
}

interface PlusActionsProps {
  original: string;
  loadIndex?: number;
  speedSymbol?: string;
  tolerancePct: number;
}

/** What to do with the current size and the picked ones: save them as a Fit card, or ask the shop for a price. */
export function PlusActions({ original, loadIndex, speedSymbol, tolerancePct }: PlusActionsProps) {
  const { picks } = useContext(PicksContext);
  const sizes = [original, ...picks];
  return (
    <div className="flex flex-col gap-4">
      <p className="text-ink-soft">
        {picks.length === 0
          ? "Tick up to three sizes in the tables to compare them with the current one, on a Fit card or in a request to the shop."
          : `Picked to compare: ${sizes.join(", ")}.`}
      </p>
      <SaveFitCard draft={{ sizes, loadIndex, speedSymbol, tolerancePct }} />
      <AskTheShop source="plus" reference={original} tires={plusQuoteTires({ designation: original, loadIndex, speedSymbol }, picks)} />
    </div>
  );
}
