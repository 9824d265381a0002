"use client";

import dynamic from "next/dynamic";
import { useState } from "react";

/** What a card is saved with; the finder fills in everything the judge reads about the original. */
export interface FitCardDraft {
  sizes: string[];
  skus?: string[];
  loadIndex?: number;
  loadIndexDual?: number;
  speedSymbol?: string;
  loadRange?: string;
  runFlat?: boolean;
  minLoadIndex?: number;
  minLoadIndexDual?: number;
  originalSeason?: string;
  tolerancePct?: number;
}

// The form and its checks load when someone opens it, not with the page.
const SaveFitCardForm = dynamic(() => import("./save-fit-card-form").then((module) => module.SaveFitCardForm), {
  loading: () => <p className="text-ink-soft">Opening the form…</p>,
});

/** "Save as Fit card": a button that opens the form. */
export function SaveFitCard({ draft }: { draft: FitCardDraft }) {
  const [open, setOpen] = useState(false);
  if (open) return <SaveFitCardForm draft={draft} onCancel={() => setOpen(false)} />;
  return (
    <button type="button" onClick={() => setOpen(true)} className="min-h-11 self-start rounded border border-accent px-4 font-semibold text-accent print:hidden">
      Save as Fit card
    </button>
  );
}
