"use client";

import { useRouter } from "next/navigation";
import { useId, useRef, useState, type FormEvent } from "react";
import { fieldClass, FormField } from "@/components/ui/form-field";
import { recordWalkIn } from "@/lib/quotes/actions";
import { MAX_QUANTITY, MIN_QUANTITY } from "@/lib/quotes/quote-limits";

const FIELDS = ["name", "email", "phone", "vehicle", "quantity", "tires"] as const;

type Outcome = Awaited<ReturnType<typeof recordWalkIn>>;

/**
 * For staff (the finder shows it once the browser has read the session): records the customer at
 * the counter as a request with the picked tires, then opens it to price an offer.
 */
export function RecordCustomer({ tires, skus, quantity }: { tires: string; skus: string[]; quantity: number }) {
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const router = useRouter();
  const id = useId();

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const text = (name: string) => String(form.get(name) ?? "");
    setBusy(true);
    const recorded = await recordWalkIn({ name: text("name"), email: text("email"), phone: text("phone"), vehicle: text("vehicle"), tires: text("tires"), quantity: text("quantity"), skus });
    setOutcome(recorded);
    if (recorded.ok) {
      router.push(`/counter/requests/${recorded.data.id}`);
      return;
    }
    setBusy(false);
    const first = FIELDS.find((field) => recorded.fieldErrors?.[field]);
    formRef.current?.querySelector<HTMLElement>(first ? `[name="${first}"]` : "[role=alert]")?.focus();
  }

  const errors = outcome && !outcome.ok ? (outcome.fieldErrors ?? {}) : {};
  const panelId = `${id}-panel`;
  return (
    <section aria-labelledby={`${id}-title`} className="rounded border border-rule bg-sheet p-4 print:hidden">
      <h2 id={`${id}-title`} className="text-lg font-semibold">
        <button type="button" aria-expanded={open} aria-controls={panelId} onClick={() => setOpen((value) => !value)} className="flex min-h-11 w-full items-center justify-between gap-3 text-left text-accent">
          Record a customer
          <span aria-hidden="true" className="font-mono text-xl">
            {open ? "−" : "+"}
          </span>
        </button>
      </h2>
      {open ? null : <p className="text-ink-soft">Staff: keep a customer at the counter as a request with these tires, then price an offer for them.</p>}
      <div id={panelId} hidden={!open}>
        {open ? (
          <form ref={formRef} onSubmit={submit} noValidate className="mt-3 grid gap-3 sm:grid-cols-2">
            <FormField id={`${id}-name`} label="Customer's name" error={errors.name}>
              {(control) => <input {...control} name="name" autoComplete="off" className={fieldClass} />}
            </FormField>
            <FormField id={`${id}-email`} label="Customer's e-mail" hint="The offer's link goes here." error={errors.email}>
              {(control) => <input {...control} name="email" type="email" autoComplete="off" className={fieldClass} />}
            </FormField>
            <FormField id={`${id}-phone`} label="Customer's phone (optional)" error={errors.phone}>
              {(control) => <input {...control} name="phone" type="tel" autoComplete="off" className={fieldClass} />}
            </FormField>
            <FormField id={`${id}-vehicle`} label="Customer's vehicle" error={errors.vehicle}>
              {(control) => <input {...control} name="vehicle" autoComplete="off" className={fieldClass} />}
            </FormField>
            <FormField id={`${id}-quantity`} label="How many tires" error={errors.quantity}>
              {(control) => <input {...control} name="quantity" type="number" inputMode="numeric" min={MIN_QUANTITY} max={MAX_QUANTITY} defaultValue={quantity} className={fieldClass} />}
            </FormField>
            <div className="sm:col-span-2">
              <FormField id={`${id}-tires`} label="Tires" hint="Filled in from the finder: the tire on the car, then the tires picked." error={errors.tires}>
                {(control) => <textarea {...control} name="tires" rows={3} defaultValue={tires} className={`${fieldClass} py-2`} />}
              </FormField>
            </div>
            <p role="alert" tabIndex={-1} className="text-sm text-danger empty:hidden sm:col-span-2">
              {outcome && !outcome.ok ? outcome.message : ""}
            </p>
            <button type="submit" disabled={busy} className="min-h-11 justify-self-start rounded bg-accent px-4 font-semibold text-sheet disabled:opacity-60">
              {busy ? "Recording…" : "Record and price an offer"}
            </button>
          </form>
        ) : null}
      </div>
    </section>
  );
}
