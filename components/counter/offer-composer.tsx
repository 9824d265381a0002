"use client";

import { useRef, useState, type FormEvent } from "react";
import { EstimateBreakdown } from "@/components/ui/estimate-breakdown";
import { fieldClass, FormField } from "@/components/ui/form-field";
import { sendOffer } from "@/lib/offers/actions";
import { estimatePackage, type ShopCharges } from "@/lib/money/estimate";
import type { OfferTire } from "@/lib/offers/offer-tire";
import { OfferLines, type ComposerLine } from "./offer-lines";
import { OfferSent } from "./offer-sent";

interface OfferComposerProps {
  requestId: number;
  /** How many each line starts with: the request's quantity, within what one line may hold. */
  quantity: number;
  /** The catalog tires the request names, offered first. */
  namedTires: OfferTire[];
  charges: ShopCharges;
  /** Local dates in the shop's zone: today, the default last day, the latest allowed. */
  validDays: { today: string; standard: string; latest: string };
}

type Outcome = Awaited<ReturnType<typeof sendOffer>>;

/** Staff price a request: tires and quantities, how long the offer holds and a note, with the estimate as it changes; then the link. */
export function OfferComposer({ requestId, quantity, namedTires, charges, validDays }: OfferComposerProps) {
  const [lines, setLines] = useState<ComposerLine[]>(namedTires.map((tire, index) => ({ tire, included: index === 0, quantity })));
  const [validUntil, setValidUntil] = useState(validDays.standard);
  const [message, setMessage] = useState("");
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const alertRef = useRef<HTMLParagraphElement>(null);
  const included = lines.filter((line) => line.included);
  const estimate = included.length > 0 ? estimatePackage(included.map((line) => ({ priceCents: line.tire.priceCents, quantity: line.quantity })), charges) : null;
  const errors = outcome && !outcome.ok ? (outcome.fieldErrors ?? {}) : {};
  const linesError = Object.entries(errors).find(([field]) => field.startsWith("lines"))?.[1];

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    const sent = await sendOffer({ requestId, lines: included.map((line) => ({ sku: line.tire.sku, quantity: line.quantity })), validUntil, message });
    setBusy(false);
    setOutcome(sent);
    if (!sent.ok) alertRef.current?.focus();
  }

  if (outcome?.ok) return <OfferSent message={outcome.message ?? ""} url={outcome.data.url} onAnother={() => setOutcome(null)} />;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4 rounded border border-rule bg-sheet p-4">
      <OfferLines lines={lines} quantity={quantity} error={linesError} onChange={setLines} />
      {estimate ? <EstimateBreakdown estimate={estimate} mixedPrices={new Set(included.map((line) => line.tire.priceCents)).size > 1} className="max-w-md" /> : <p className="text-ink-soft">Tick at least one tire to see the estimate.</p>}
      <div className="grid gap-4 sm:grid-cols-[minmax(0,14rem)_minmax(0,1fr)]">
        <FormField id="offer-valid-until" label="Valid until" hint="The offer holds until the end of this day in the shop's time zone." error={errors.validUntil}>
          {(control) => <input {...control} type="date" required min={validDays.today} max={validDays.latest} value={validUntil} onChange={(event) => setValidUntil(event.target.value)} className={fieldClass} />}
        </FormField>
        <FormField id="offer-message" label="Message to the driver (optional)" hint="A line or two: when the tires came in, what the price includes." error={errors.message}>
          {(control) => <textarea {...control} rows={3} maxLength={1000} value={message} onChange={(event) => setMessage(event.target.value)} className={`${fieldClass} py-2`} />}
        </FormField>
      </div>
      <p ref={alertRef} tabIndex={-1} role="alert" className="text-sm text-danger empty:hidden">
        {outcome && !outcome.ok ? outcome.message : ""}
      </p>
      <button type="submit" disabled={busy || included.length === 0} className="min-h-11 self-start rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
        {busy ? "Sending…" : "Send the offer"}
      </button>
    </form>
  );
}
