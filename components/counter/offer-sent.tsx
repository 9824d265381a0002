"use client";

import { useEffect, useRef, useState } from "react";

/** After an offer is saved: what happened, its link to copy for the driver, and a way to price another. */
export function OfferSent({ message, url, onAnother }: { message: string; url: string; onAnother: () => void }) {
  const [copied, setCopied] = useState(false);
  const statusRef = useRef<HTMLDivElement>(null);
  useEffect(() => statusRef.current?.focus(), []);

  async function copy() {
    try {
      await navigator.clipboard.writeText(url);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  }

  return (
    <div ref={statusRef} tabIndex={-1} role="status" className="flex flex-col gap-3 rounded border-l-4 border-accent bg-accent-soft p-4">
      <p className="font-semibold">{message}</p>
      <label htmlFor="offer-link" className="font-semibold">
        The offer&apos;s link
      </label>
      <div className="flex flex-wrap gap-2">
        <input id="offer-link" readOnly value={url} onFocus={(event) => event.target.select()} className="min-h-11 min-w-0 flex-1 basis-64 rounded border border-rule bg-sheet px-3 font-mono text-sm" />
        <button type="button" onClick={() => void copy()} className="min-h-11 rounded border border-accent bg-sheet px-4 font-semibold text-accent">
          {copied ? "Copied" : "Copy the link"}
        </button>
      </div>
      <button type="button" onClick={onAnother} className="min-h-11 self-start font-semibold text-accent underline underline-offset-4">
        Price another offer
      </button>
    </div>
  );
}
