"use client";

import { useEffect, useId, useRef, useState, type FormEvent } from "react";
import { DEFAULT_QUANTITY, HONEYPOT_FIELD, MAX_QUANTITY, MIN_QUANTITY, PREFERRED_DAY_MAX_AHEAD } from "@/lib/quotes/quote-limits";
import { fetchFormToken, postQuoteRequest, type QuoteContext, type QuoteOutcome } from "./post-quote-request";
import { fieldClass, FormField } from "@/components/ui/form-field";
import { StockLine } from "@/components/ui/stock-line";
import type { QuoteCatalogTire } from "./quote-tires";

const FIELD_ORDER = ["name", "email", "phone", "vehicle", "tires", "quantity", "preferredDay"] as const;

function localDay(offsetDays = 0): string {
  const day = new Date();
  day.setDate(day.getDate() + offsetDays);
  return `${day.getFullYear()}-${String(day.getMonth() + 1).padStart(2, "0")}-${String(day.getDate()).padStart(2, "0")}`;
}

interface QuoteFormProps {
  context: QuoteContext;
  tires: string;
  /** The catalog tires the page names, shown with how many are on hand against the number asked for. */
  catalogTires?: QuoteCatalogTire[];
  /** How many tires the form starts with. */
  quantity?: number;
  onCancel: () => void;
}

/** The number typed, while it is one the form takes; else the number the form started with. */
function wantedCount(text: string, fallback: number): number {
  const count = Number(text);
  return Number.isInteger(count) && count >= MIN_QUANTITY && count <= MAX_QUANTITY ? count : fallback;
}

/** The request form itself; loaded only when a driver opens "Ask the shop for a price". */
export default function QuoteForm({ context, tires, catalogTires = [], quantity = DEFAULT_QUANTITY, onCancel }: QuoteFormProps) {
  const id = useId();
  const [countText, setCountText] = useState(String(quantity));
  const wanted = wantedCount(countText, quantity);
  const [renderedAt, setRenderedAt] = useState("");
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<QuoteOutcome | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const doneRef = useRef<HTMLDivElement>(null);
  const alertRef = useRef<HTMLParagraphElement>(null);

  useEffect(() => {
    let current = true;
    void fetchFormToken().then((token) => {
      if (current && token) setRenderedAt(token);
    });
    return () => {
      current = false;
    };
  }, []);

  useEffect(() => {
    if (!outcome) return;
    if (outcome.ok) {
      doneRef.current?.focus();
      return;
    }
    const first = FIELD_ORDER.find((name) => outcome.fieldErrors[name]);
    if (first) formRef.current?.querySelector<HTMLElement>(`[name="${first}"]`)?.focus();
    else alertRef.current?.focus();
  }, [outcome]);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setOutcome(await postQuoteRequest(context, new FormData(event.currentTarget)));
    setBusy(false);
  }

  if (outcome?.ok) {
    return (
      <div ref={doneRef} tabIndex={-1} role="status" className="rounded border-l-4 border-accent bg-accent-soft p-4">
        <p className="font-semibold">Your request is with the shop (number {outcome.id}).</p>
        <p className="mt-1">
          A confirmation is on its way to <span className="break-all">{outcome.email}</span>. The shop answers by e-mail with a price, usually within one
          working day; nothing is booked or charged until you agree.
        </p>
      </div>
    );
  }
  const error = (name: string) => (outcome && !outcome.ok ? outcome.fieldErrors[name] : undefined);
  return (
    <form ref={formRef} onSubmit={submit} noValidate className="@container flex flex-col gap-4">
      <input type="hidden" name="renderedAt" value={renderedAt} />
      <div className="grid gap-4 @xl:grid-cols-2">
        <FormField id={`${id}-name`} label="Your name" error={error("name")}>
          {(control) => <input {...control} name="name" autoComplete="name" className={fieldClass} />}
        </FormField>
        <FormField id={`${id}-email`} label="E-mail (the answer goes here)" error={error("email")}>
          {(control) => <input {...control} name="email" type="email" autoComplete="email" className={fieldClass} />}
        </FormField>
        <FormField id={`${id}-phone`} label="Phone (optional)" error={error("phone")}>
          {(control) => <input {...control} name="phone" type="tel" autoComplete="tel" className={fieldClass} />}
        </FormField>
        <FormField id={`${id}-vehicle`} label="Vehicle" hint="Year and kind is enough, such as “2019 family SUV”." error={error("vehicle")}>
          {(control) => <input {...control} name="vehicle" className={fieldClass} />}
        </FormField>
      </div>
      <FormField id={`${id}-tires`} label="Tires or size" hint="Filled in from this page; change it as you like." error={error("tires")}>
        {(control) => <textarea {...control} name="tires" rows={2} defaultValue={tires} className={`${fieldClass} py-2`} />}
      </FormField>
      <div className="grid gap-4 @xl:grid-cols-2">
        <FormField id={`${id}-quantity`} label={`How many tires (${MIN_QUANTITY}–${MAX_QUANTITY})`} error={error("quantity")}>
          {(control) => (
            <input
              {...control}
              name="quantity"
              type="number"
              inputMode="numeric"
              min={MIN_QUANTITY}
              max={MAX_QUANTITY}
              value={countText}
              onChange={(event) => setCountText(event.target.value)}
              className={fieldClass}
            />
          )}
        </FormField>
        <FormField id={`${id}-preferredDay`} label="Preferred day for fitting (optional)" hint={`Up to ${PREFERRED_DAY_MAX_AHEAD} days ahead.`} error={error("preferredDay")}>
          {(control) => <input {...control} name="preferredDay" type="date" min={localDay()} max={localDay(PREFERRED_DAY_MAX_AHEAD)} className={fieldClass} />}
        </FormField>
      </div>
      {catalogTires.length > 0 ? (
        <section aria-labelledby={`${id}-stock`} aria-live="polite" className="rounded border border-rule p-3">
          <h3 id={`${id}-stock`} className="text-sm font-semibold">
            On hand at the shop now, for {wanted} {wanted === 1 ? "tire" : "tires"}
          </h3>
          <ul className="mt-1 flex flex-col gap-1">
            {catalogTires.map((tire) => (
              <li key={tire.sku} className="text-sm">
                <span>{tire.label}</span>
                <StockLine quantity={tire.quantity} needed={wanted} />
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <div className="sr-only">
        <label htmlFor={`${id}-${HONEYPOT_FIELD}`}>Leave this field empty: it is only here to catch automated spam</label>
        <input id={`${id}-${HONEYPOT_FIELD}`} name={HONEYPOT_FIELD} type="text" tabIndex={-1} autoComplete="off" defaultValue="" />
      </div>
      <p ref={alertRef} tabIndex={-1} role="alert" className="text-danger">
        {outcome && !outcome.ok ? outcome.message : ""}
      </p>
      <p className="text-sm text-ink-soft">The shop uses your details only to answer this request.</p>
      <div className="flex flex-wrap gap-2">
        <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
          {busy ? "Sending…" : "Send the request"}
        </button>
        <button type="button" onClick={onCancel} className="min-h-11 rounded border border-rule px-4 font-semibold">
          Cancel
        </button>
      </div>
    </form>
  );
}
