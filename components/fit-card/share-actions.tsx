"use client";

import { useSyncExternalStore } from "react";
import { useCopyLink } from "./use-copy-link";

const neverChanges = () => () => undefined;

/** Copy the card's link, hand it to the phone's share sheet where there is one, or print it. */
export function ShareActions({ url, title }: { url: string; title: string }) {
  const { status, copy } = useCopyLink();
  // Known only in the browser: the server renders without the share button.
  const canShare = useSyncExternalStore(neverChanges, () => typeof navigator.share === "function", () => false);

  async function share() {
    try {
      await navigator.share({ title, url });
    } catch {
      // Closing the share sheet is not an error worth showing.
    }
  }

  const button = "min-h-11 rounded border border-accent px-3 font-semibold text-accent";
  return (
    <div className="flex flex-wrap items-center gap-2 print:hidden">
      <button type="button" onClick={() => copy(url)} className={button}>
        Copy link
      </button>
      {canShare ? (
        <button type="button" onClick={share} className={button}>
          Share…
        </button>
      ) : null}
      <button type="button" onClick={() => window.print()} className={button}>
        Print
      </button>
      <p role="status" className="basis-full text-sm text-ink-soft">
        {status}
      </p>
    </div>
  );
}
