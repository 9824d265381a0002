"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { fieldClass, FormField } from "@/components/ui/form-field";
import { type FitCardEmailBody, fitCardEmailBodySchema, MAX_EMAIL_MESSAGE_LENGTH } from "@/lib/email/fit-card-email-input";

type SendState =
  | { step: "idle" }
  | { step: "sending" }
  | { step: "sent"; to: string; providerId: string }
  | { step: "failed"; message: string; body: FitCardEmailBody }
  | { step: "refused"; message: string };

/** A fresh Idempotency-Key; getRandomValues also works on a plain-http address, unlike randomUUID. */
function newIdempotencyKey(): string {
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (byte) => byte.toString(16).padStart(2, "0")).join("");
}

function fieldErrorsOf(issues: { path: PropertyKey[]; message: string }[]): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of issues) errors[String(issue.path[0] ?? "form")] ??= issue.message;
  return errors;
}

async function postEmail(slug: string, body: FitCardEmailBody, key: string): Promise<SendState> {
  try {
    const response = await fetch(`/api/v1/fit-cards/${slug}/email`, {
      method: "POST",
      headers: { "content-type": "application/json", "idempotency-key": key },
      body: JSON.stringify(body),
    });
    const answer = (await response.json().catch(() => null)) as { status?: string; providerId?: string; message?: string; error?: { message?: string } } | null;
    if (response.status === 202 && answer?.status === "sent") return { step: "sent", to: body.to, providerId: answer.providerId ?? "" };
    if (response.status === 202) return { step: "failed", message: answer?.message ?? "The e-mail service did not accept it.", body };
    return { step: "refused", message: answer?.error?.message ?? `The shop's server answered ${response.status}. Please try again.` };
  } catch {
    return { step: "failed", message: "The shop's server could not be reached. Check the connection.", body };
  }
}

/** Staff e-mail the card's link. "Try again" reuses the same Idempotency-Key, so a retry never sends twice. */
export function EmailCardForm({ slug }: { slug: string }) {
  const router = useRouter();
  const [key, setKey] = useState(newIdempotencyKey);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [state, setState] = useState<SendState>({ step: "idle" });

  async function send(body: FitCardEmailBody) {
    setState({ step: "sending" });
    const outcome = await postEmail(slug, body, key);
    setState(outcome);
    if (outcome.step === "sent") setKey(newIdempotencyKey());
    router.refresh();
  }

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const parsed = fitCardEmailBodySchema.safeParse({ to: String(form.get("to") ?? "").trim(), message: String(form.get("message") ?? "") || undefined });
    if (!parsed.success) {
      setErrors(fieldErrorsOf(parsed.error.issues));
      return;
    }
    setErrors({});
    void send(parsed.data);
  }

  // A changed address or message is another e-mail: it gets its own key, and the old retry goes.
  const edited = () => {
    if (state.step === "sending") return;
    setKey(newIdempotencyKey());
    if (state.step === "failed") setState({ step: "idle" });
  };

  return (
    <form noValidate onSubmit={submit} onChange={edited} className="flex max-w-xl flex-col gap-4" aria-describedby="email-card-status">
      <FormField id="to" label="Send to" error={errors.to}>
        {(control) => <input {...control} name="to" type="email" autoComplete="off" required className={fieldClass} />}
      </FormField>
      <FormField
        id="message"
        label={
          <>
            Message <span className="font-normal text-ink-soft">(optional, up to {MAX_EMAIL_MESSAGE_LENGTH} characters)</span>
          </>
        }
        error={errors.message}
      >
        {(control) => <textarea {...control} name="message" rows={3} maxLength={MAX_EMAIL_MESSAGE_LENGTH} className={`${fieldClass} py-2`} />}
      </FormField>
      <div className="flex flex-wrap gap-3">
        <button type="submit" disabled={state.step === "sending"} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
          {state.step === "sending" ? "Sending…" : "Send"}
        </button>
        {state.step === "failed" ? (
          <button type="button" onClick={() => void send(state.body)} className="min-h-11 rounded border border-accent px-4 font-semibold text-accent">
            Try again
          </button>
        ) : null}
      </div>
      <div id="email-card-status" role="status" aria-live="polite" className="min-h-6">
        {state.step === "sending" ? <p>Sending…</p> : null}
        {state.step === "sent" ? (
          <p>
            <strong>Sent</strong> to {state.to}. <span className="text-sm text-ink-soft">Provider id: <span className="font-mono break-all">{state.providerId}</span></span>
          </p>
        ) : null}
        {state.step === "failed" ? (
          <p className="text-danger">
            <strong>Not sent:</strong> {state.message} Try again: the retry can never deliver it twice.
          </p>
        ) : null}
        {state.step === "refused" ? <p className="text-danger">{state.message}</p> : null}
      </div>
    </form>
  );
}
