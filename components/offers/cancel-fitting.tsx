"use client";

import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { cancelFitting } from "./post-offer";

const buttonClass = "min-h-11 rounded border border-rule px-3 text-sm font-semibold disabled:opacity-60";

/** Cancels the booked fitting after a second, explicit step (a slip of the finger is easy on a phone). */
export function CancelFitting({ token, when }: { token: string; when: string }) {
  const router = useRouter();
  const [step, setStep] = useState<"idle" | "confirm" | "busy">("idle");
  const [error, setError] = useState("");
  const keep = useRef<HTMLButtonElement>(null);
  const start = useRef<HTMLButtonElement>(null);
  const asked = useRef(false);

  // Focus follows the step: to the safe answer when asked, back to the first button when kept.
  useEffect(() => {
    if (step === "confirm") {
      asked.current = true;
      keep.current?.focus();
    } else if (step === "idle" && asked.current) start.current?.focus();
  }, [step]);

  async function cancel() {
    setStep("busy");
    const answer = await cancelFitting(token);
    if (answer.ok) {
      router.refresh();
      return;
    }
    setError(answer.message);
    setStep("idle");
    if (answer.gone || answer.code === "too_late") router.refresh();
  }

  return (
    <div className="flex flex-col gap-2 print:hidden">
      {step === "idle" ? (
        <button ref={start} type="button" onClick={() => setStep("confirm")} className={`${buttonClass} self-start`}>
          Cancel this fitting
        </button>
      ) : (
        <div role="group" aria-labelledby="cancel-question" className="flex flex-col gap-2 rounded border border-danger p-3">
          <p id="cancel-question" className="font-semibold">
            Cancel the fitting on {when}? The time is given up and the tires go back on sale.
          </p>
          <div className="flex flex-wrap gap-2">
            <button type="button" onClick={cancel} disabled={step === "busy"} className="min-h-11 rounded bg-danger px-3 text-sm font-semibold text-sheet disabled:opacity-60">
              {step === "busy" ? "Cancelling…" : "Yes, cancel the fitting"}
            </button>
            <button ref={keep} type="button" onClick={() => setStep("idle")} disabled={step === "busy"} className={buttonClass}>
              Keep the booking
            </button>
          </div>
        </div>
      )}
      <p role="alert" className="text-sm font-semibold text-danger">
        {error}
      </p>
    </div>
  );
}
