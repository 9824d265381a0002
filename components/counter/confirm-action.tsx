"use client";

import { useEffect, useRef, useState } from "react";

type Outcome = { ok: boolean; message?: string };

interface ConfirmActionProps {
  label: string;
  /** What happens, asked before doing it. */
  question: string;
  confirmLabel: string;
  keepLabel: string;
  danger?: boolean;
  run: () => Promise<Outcome>;
}

/** A button that asks once more before an irreversible change, then says how it went. */
export function ConfirmAction({ label, question, confirmLabel, keepLabel, danger = false, run }: ConfirmActionProps) {
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const confirmRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (confirming) confirmRef.current?.focus();
  }, [confirming]);

  async function confirm() {
    setBusy(true);
    const result = await run();
    setBusy(false);
    setConfirming(false);
    setOutcome(result);
  }

  const tone = danger ? "border-danger text-danger" : "border-accent text-accent";
  return (
    <div className="flex flex-wrap items-center gap-2">
      {confirming ? (
        <div className="flex basis-full flex-wrap items-center gap-2 rounded border border-rule bg-paper p-3">
          <p className="basis-full">{question}</p>
          <button ref={confirmRef} type="button" onClick={() => void confirm()} disabled={busy} className={`min-h-11 rounded px-4 font-semibold text-sheet disabled:opacity-60 ${danger ? "bg-danger" : "bg-accent"}`}>
            {busy ? "Saving…" : confirmLabel}
          </button>
          <button type="button" onClick={() => setConfirming(false)} disabled={busy} className="min-h-11 rounded border border-rule bg-sheet px-4 font-semibold">
            {keepLabel}
          </button>
        </div>
      ) : (
        <button type="button" onClick={() => setConfirming(true)} className={`min-h-11 rounded border bg-sheet px-4 font-semibold ${tone}`}>
          {label}
        </button>
      )}
      <p role="status" className={`basis-full text-sm empty:hidden ${outcome && !outcome.ok ? "text-danger" : "text-ink-soft"}`}>
        {outcome?.message ?? ""}
      </p>
    </div>
  );
}
