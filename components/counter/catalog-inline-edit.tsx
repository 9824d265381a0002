"use client";

import { useRouter } from "next/navigation";
import { useEffect, useId, useRef, useState, type FormEvent, type KeyboardEvent } from "react";
import { useHydrated } from "./item-controls";
import { centsToDollarsText, formatPrice, parseDollars } from "@/lib/money/money";
import { parseWholeNumber, sendCatalogWrite } from "./item-form-values";

type Status =
  | { kind: "idle" }
  | { kind: "saving" }
  /** Saved, with the value before, which Undo puts back for a few seconds. */
  | { kind: "saved"; previous: number; now: number }
  | { kind: "undone"; now: number }
  | { kind: "error"; message: string };

/** How long a saved change offers Undo. */
const UNDO_MILLISECONDS = 8_000;

interface CatalogInlineEditProps {
  sku: string;
  field: "priceCents" | "quantity";
  value: number;
  label: string;
}

const invalidMessage = {
  priceCents: "Enter a price in dollars, like 189.99.",
  quantity: "Enter a whole number, 0 or more.",
};

/**
 * One price or quantity in the table, changed in place: Enter or leaving the field saves, Escape puts
 * the typed text back, and for a few seconds after a save "Undo" restores the value before.
 */
export function CatalogInlineEdit({ sku, field, value, label }: CatalogInlineEditProps) {
  const router = useRouter();
  const id = useId();
  const hydrated = useHydrated();
  const shown = field === "priceCents" ? centsToDollarsText(value) : String(value);
  const [text, setText] = useState(shown);
  const [status, setStatus] = useState<Status>({ kind: "idle" });
  const lastSent = useRef(value);
  const shownAs = (amount: number) => (field === "priceCents" ? centsToDollarsText(amount) : String(amount));
  const said = (amount: number) => (field === "priceCents" ? formatPrice(amount) : String(amount));

  useEffect(() => {
    if (status.kind !== "saved") return;
    const timer = setTimeout(() => setStatus({ kind: "idle" }), UNDO_MILLISECONDS);
    return () => clearTimeout(timer);
  }, [status]);

  async function write(next: number, done: (previous: number) => Status) {
    const previous = lastSent.current;
    lastSent.current = next;
    setStatus({ kind: "saving" });
    const result = await sendCatalogWrite("PATCH", `/api/v1/catalog/${encodeURIComponent(sku)}`, { [field]: next });
    if (result.ok) {
      setText(shownAs(next));
      setStatus(done(previous));
      router.refresh();
    } else {
      lastSent.current = previous;
      setStatus({ kind: "error", message: result.message });
    }
  }

  async function save() {
    const parsed = field === "priceCents" ? parseDollars(text) : parseWholeNumber(text);
    if (parsed === null) {
      setStatus({ kind: "error", message: invalidMessage[field] });
      return;
    }
    if (parsed === lastSent.current) {
      if (status.kind === "error") setStatus({ kind: "idle" });
      return;
    }
    await write(parsed, (previous) => ({ kind: "saved", previous, now: parsed }));
  }

  function undo(previous: number) {
    void write(previous, () => ({ kind: "undone", now: previous }));
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    void save();
  }

  function cancelOnEscape(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key !== "Escape") return;
    setText(shownAs(lastSent.current));
    setStatus({ kind: "idle" });
  }

  const what = field === "priceCents" ? "Price" : "Quantity";
  const message =
    status.kind === "saving" ? "Saving…"
    : status.kind === "saved" ? `${what} changed to ${said(status.now)}`
    : status.kind === "undone" ? `${what} back to ${said(status.now)}`
    : status.kind === "error" ? status.message
    : "";
  return (
    <form onSubmit={submit} className="flex flex-col items-end gap-0.5">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <span className="flex items-center gap-1">
        {field === "priceCents" ? <span aria-hidden="true">$</span> : null}
        <input
          id={id}
          value={text}
          readOnly={!hydrated}
          inputMode={field === "priceCents" ? "decimal" : "numeric"}
          autoComplete="off"
          onChange={(event) => setText(event.target.value)}
          onKeyDown={cancelOnEscape}
          onBlur={() => void save()}
          aria-invalid={status.kind === "error" ? true : undefined}
          aria-describedby={`${id}-status`}
          className={`min-h-11 rounded border border-rule bg-paper px-2 text-right font-mono aria-invalid:border-danger ${field === "priceCents" ? "w-24" : "w-16"}`}
        />
      </span>
      <span id={`${id}-status`} role="status" className={`max-w-28 text-right text-xs lg:max-w-40 ${status.kind === "error" ? "text-danger" : "text-ink-soft"}`}>
        {message}
        {status.kind === "saved" ? (
          <>
            {" · "}
            <button type="button" onClick={() => undo(status.previous)} className="min-h-6 font-semibold text-accent underline underline-offset-2">
              Undo
            </button>
          </>
        ) : null}
      </span>
    </form>
  );
}
