"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import { useBrowserSession } from "@/components/auth/use-browser-session";
import { hasRole, SAVE_FIT_CARD_ROLE } from "@/lib/tire/vocabulary";
import { CopyOrSignIn } from "./copy-or-sign-in";

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
  /** The depths left on the tires that stay on an all-wheel-drive vehicle, and the limit between any two. */
  wear?: { remaining32: number[]; limit32: number };
}

// The form and its checks load when someone opens it, not with the page.
const SaveFitCardForm = dynamic(() => import("./save-fit-card-form").then((module) => module.SaveFitCardForm), {
  loading: () => <p className="text-ink-soft">Opening the form…</p>,
});

/**
 * "Save as Fit card" for those who may save one (read in the browser, so the page stays the same
 * for everyone); everyone else gets the page's link to copy, and a way to sign in.
 */
export function SaveFitCard({ draft }: { draft: FitCardDraft }) {
  const [session] = useBrowserSession();
  const [open, setOpen] = useState(false);
  if (session === "loading") return <div className="min-h-11 print:hidden" aria-hidden="true" />;
  if (session === "signed-out" || !hasRole(session.role, SAVE_FIT_CARD_ROLE)) return <CopyOrSignIn signedOut={session === "signed-out"} />;
  if (open) return <SaveFitCardForm draft={draft} onCancel={() => setOpen(false)} />;
  return (
    <button type="button" onClick={() => setOpen(true)} className="min-h-11 self-start rounded border border-accent px-4 font-semibold text-accent print:hidden">
      Save as Fit card
    </button>
  );
}
