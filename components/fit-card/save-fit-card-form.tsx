"use client";

import { useId, useState, type FormEvent } from "react";
import { fieldClass, FormField } from "@/components/ui/form-field";
import { MAX_NOTE_LENGTH } from "@/lib/fit-cards/card-limits";
import { postFitCard, type SaveOutcome } from "./post-fit-card";
import type { FitCardDraft } from "./save-fit-card-button";


/**
 * The "Save as Fit card" form: asks for what the card needs that the page does not know (the
 * original's load index and speed symbol), a note and how long the link should work, then saves it
 * through the API. Loaded only when someone opens it (see save-fit-card-button.tsx).
 */
export function SaveFitCardForm({ draft, onCancel }: { draft: FitCardDraft; onCancel: () => void }) {
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<SaveOutcome | null>(null);
  const id = useId();
  const needsService = draft.loadIndex === undefined || draft.speedSymbol === undefined;

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setOutcome(await postFitCard(draft, new FormData(event.currentTarget)));
    setBusy(false);
  }

  if (outcome?.ok) {
    return (
      <div role="status" className="rounded border-l-4 border-accent bg-accent-soft p-4">
        <p className="font-semibold">Fit card saved.</p>
        <p className="mt-1 break-all">
          <a href={outcome.url} className="font-semibold text-accent underline underline-offset-4">
            {outcome.url}
          </a>
        </p>
      </div>
    );
  }
  const error = (name: string) => (outcome && !outcome.ok ? outcome.fieldErrors[name] : undefined);
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3 rounded border border-rule bg-sheet p-4 print:hidden" aria-labelledby={`${id}-title`}>
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        Save as Fit card
      </h2>
      <p className="text-sm text-ink-soft">
        {draft.sizes.join(", ")}
        {draft.skus?.length ? ` · ${draft.skus.length} ${draft.skus.length === 1 ? "tire" : "tires"} picked` : ""}
        {draft.wear ? ` · judged beside the tires that stay (${draft.wear.remaining32.join(", ")}/32 in)` : ""}
      </p>
      {needsService ? (
        <div className="grid grid-cols-2 gap-3">
          <FormField id={`${id}-load`} label="Load index on the car" error={error("loadIndex")}>
            {(control) => <input {...control} name="loadIndex" inputMode="numeric" defaultValue={draft.loadIndex ?? ""} className={fieldClass} />}
          </FormField>
          <FormField id={`${id}-speed`} label="Speed symbol on the car" error={error("speedSymbol")}>
            {(control) => <input {...control} name="speedSymbol" defaultValue={draft.speedSymbol ?? ""} className={fieldClass} />}
          </FormField>
        </div>
      ) : null}
      <FormField id={`${id}-note`} label="Note for the customer (optional)" error={error("note")}>
        {(control) => <textarea {...control} name="note" rows={3} maxLength={MAX_NOTE_LENGTH} className={`${fieldClass} py-2`} />}
      </FormField>
      <FormField id={`${id}-expiry`} label="The link works" error={error("expiresInDays")}>
        {(control) => (
          <select {...control} name="expiresInDays" defaultValue="30" className={fieldClass}>
            <option value="">until withdrawn</option>
            <option value="7">for 7 days</option>
            <option value="30">for 30 days</option>
            <option value="90">for 90 days</option>
          </select>
        )}
      </FormField>
      <div role="alert" className="text-danger">
        {outcome && !outcome.ok ? (
          <>
            {outcome.message}{" "}
            {outcome.signIn ? (
              <a href={`/sign-in?next=${encodeURIComponent(window.location.pathname + window.location.search)}`} className="font-semibold underline">
                Sign in
              </a>
            ) : null}
          </>
        ) : null}
      </div>
      <div className="flex flex-wrap gap-2">
        <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
          {busy ? "Saving…" : "Save the card"}
        </button>
        <button type="button" onClick={onCancel} className="min-h-11 rounded border border-rule px-4 font-semibold">
          Cancel
        </button>
      </div>
    </form>
  );
}

