"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

/** Withdraws a card after a second click to confirm; the list then shows it as withdrawn. */
export function RevokeCardButton({ slug, label }: { slug: string; label: string }) {
  const router = useRouter();
  const [step, setStep] = useState<"idle" | "confirm" | "busy">("idle");
  const [error, setError] = useState("");

  async function revoke() {
    setStep("busy");
    const response = await fetch(`/api/v1/fit-cards/${slug}`, { method: "DELETE" }).catch(() => null);
    if (response?.status === 204) {
      router.refresh();
      return;
    }
    const answer = (await response?.json().catch(() => null)) as { error?: { message?: string } } | null;
    setError(answer?.error?.message ?? "The card could not be withdrawn. Try again.");
    setStep("idle");
  }

  return (
    <div className="flex flex-wrap items-center gap-2">
      {step === "idle" ? (
        <button type="button" onClick={() => setStep("confirm")} className="min-h-11 rounded border border-rule px-3 text-sm font-semibold">
          Withdraw<span className="sr-only"> the card for {label}</span>
        </button>
      ) : (
        <>
          <button type="button" onClick={revoke} disabled={step === "busy"} className="min-h-11 rounded bg-danger px-3 text-sm font-semibold text-sheet disabled:opacity-60">
            {step === "busy" ? "Withdrawing…" : "Yes, withdraw it"}
          </button>
          <button type="button" onClick={() => setStep("idle")} className="min-h-11 rounded border border-rule px-3 text-sm font-semibold">
            Keep it
          </button>
        </>
      )}
      <p role="status" className="basis-full text-sm text-danger">
        {error}
      </p>
    </div>
  );
}
