"use client";

import { askBarLabel } from "./pick-words";

/**
 * Below lg, once a tire is picked: a bar that sticks to the bottom of the screen while the results
 * scroll past, opening Ask the shop. Sticky rather than fixed, it ends where the results end and
 * never covers what follows them. From lg up the form is a short scroll below the page of results.
 */
export function AskBar({ picked, onAsk }: { picked: number; onAsk: () => void }) {
  if (picked === 0) return null;
  return (
    <div className="sticky bottom-0 z-10 rounded-t border-t border-rule bg-sheet px-3 pt-2 pb-[max(0.5rem,env(safe-area-inset-bottom))] shadow-[0_-4px_12px_rgb(0_0_0/0.15)] lg:hidden print:hidden">
      <button type="button" onClick={onAsk} className="min-h-11 w-full rounded bg-accent px-4 font-semibold text-sheet">
        {askBarLabel(picked)}
      </button>
    </div>
  );
}
