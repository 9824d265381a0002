"use client";

import { useActionState, useEffect, useRef } from "react";
import { sendQuoteReply } from "@/lib/quotes/actions";
import { MAX_REPLY_LENGTH } from "@/lib/quotes/quote-input";

type ReplyState = Awaited<ReturnType<typeof sendQuoteReply>> | null;

/** A reply to the driver: sent by e-mail, kept with the request, and the request marked answered. */
export function RequestReplyForm({ requestId, customerEmail }: { requestId: number; customerEmail: string }) {
  const [state, submit, pending] = useActionState<ReplyState, FormData>((_previous, form) => sendQuoteReply(form), null);
  const formRef = useRef<HTMLFormElement>(null);
  const bodyRef = useRef<HTMLTextAreaElement>(null);
  const error = state && !state.ok ? (state.fieldErrors?.body ?? state.message) : undefined;

  useEffect(() => {
    if (state?.ok) formRef.current?.reset();
    else if (state) bodyRef.current?.focus();
  }, [state]);

  return (
    <form ref={formRef} action={submit} noValidate className="flex flex-col gap-2 rounded border border-rule bg-sheet p-4">
      <input type="hidden" name="id" value={requestId} />
      <label htmlFor="reply-body" className="font-semibold">
        Reply to {customerEmail}
      </label>
      <p id="reply-hint" className="text-sm text-ink-soft">
        Plain words: the price, what is in stock and when you could fit the tires. It goes out by e-mail with the shop&apos;s contact.
      </p>
      <textarea
        ref={bodyRef}
        id="reply-body"
        name="body"
        rows={6}
        maxLength={MAX_REPLY_LENGTH}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? "reply-hint reply-status" : "reply-hint"}
        className="min-h-11 rounded border border-rule bg-paper px-3 py-2 text-base aria-invalid:border-danger"
      />
      <p id="reply-status" role="status" className={`text-sm ${error ? "text-danger" : "text-ink-soft"}`}>
        {error ?? (state?.ok ? state.message : "")}
      </p>
      <button type="submit" disabled={pending} className="min-h-11 self-start rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
        {pending ? "Sending…" : "Send the reply"}
      </button>
    </form>
  );
}
