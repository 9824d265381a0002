"use client";

import { useRouter } from "next/navigation";
import { useId, useRef, useState, type FormEvent, type KeyboardEvent } from "react";
import { useHydrated } from "./item-controls";
import { centsToDollarsText, parseDollars } from "@/lib/money/money";
import { parseWholeNumber, sendCatalogWrite } from "./item-form-values";

type Status = { kind: "idle" } | { kind: "saving" } | { kind: "saved" } | { kind: "error"; message: string };

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

/** One price or quantity in the table, changed in place: Enter or leaving the field saves, Escape puts it back. */
export function CatalogInlineEdit({ sku, field, value, label }: CatalogInlineEditProps) {
  const router = useRouter();
  const id = useId();
  const hydrated = useHydrated();
  const shown = field === "priceCents" ? centsToDollarsText(value) : String(value);
  const [text, setText] = useState(shown);
  const [status, setStatus] = useState<Status>({ kind: "idle" });
  const lastSent = useRef(value);

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
    lastSent.current = parsed;
    setStatus({ kind: "saving" });
    const result = await sendCatalogWrite("PATCH", `/api/v1/catalog/${encodeURIComponent(sku)}`, { [field]: parsed });
    if (result.ok) {
      setText(field === "priceCents" ? centsToDollarsText(parsed) : String(parsed));
      setStatus({ kind: "saved" });
      router.refresh();
    } else {
      lastSent.current = value;
      setStatus({ kind: "error", message: result.message });
    }
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    void save();
  }

  function cancelOnEscape(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key !== "Escape") return;
    setText(field === "priceCents" ? centsToDollarsText(lastSent.current) : String(lastSent.current));
    setStatus({ kind: "idle" });
  }

  const message = status.kind === "saving" ? "Saving…" : status.kind === "saved" ? "Saved" : status.kind === "error" ? status.message : "";
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
      <span id={`${id}-status`} role="status" className={`max-w-40 text-right text-xs ${status.kind === "error" ? "text-danger" : "text-ink-soft"}`}>
        {message}
      </span>
    </form>
  );
}
