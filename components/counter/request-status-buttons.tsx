"use client";

import { useActionState } from "react";
import type { QuoteStatus } from "@/db/schema";
import { setQuoteStatus } from "@/lib/quotes/actions";

type StatusState = Awaited<ReturnType<typeof setQuoteStatus>> | null;

const choices: { status: QuoteStatus; label: string }[] = [
  { status: "answered", label: "Mark answered" },
  { status: "closed", label: "Close" },
  { status: "new", label: "Reopen" },
];

/** Moves a request between new, answered and closed; the current status is not offered. */
export function RequestStatusButtons({ requestId, status }: { requestId: number; status: QuoteStatus }) {
  const [state, submit, pending] = useActionState<StatusState, FormData>((_previous, form) => setQuoteStatus(form), null);
  return (
    <form action={submit} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="id" value={requestId} />
      {choices
        .filter((choice) => choice.status !== status)
        .map((choice) => (
          <button
            key={choice.status}
            type="submit"
            name="status"
            value={choice.status}
            disabled={pending}
            className="min-h-11 rounded border border-accent px-4 font-semibold text-accent disabled:opacity-60"
          >
            {choice.label}
          </button>
        ))}
      <p role="status" className={`basis-full text-sm ${state && !state.ok ? "text-danger" : "text-ink-soft"}`}>
        {state ? state.message : ""}
      </p>
    </form>
  );
}
