"use client";

import { useEffect, useRef, useState, type FormEvent } from "react";
import { FormField } from "@/components/ui/form-field";
import { SEASONS, TERRAINS, type Season, type Terrain } from "@/lib/tire";
import { itemInputClass } from "./item-controls";
import type { LineField, LineFormValues } from "./lines-form-check";

export type LineFormErrors = Partial<Record<LineField | "form", string>>;

interface LinesLineFormProps {
  /** Prefix of the controls' ids, unique on the page. */
  idPrefix: string;
  /** What the form is about, read out as its name ("New line for Quensal"). */
  label: string;
  initial: LineFormValues;
  submitLabel: string;
  /** Sends the values; answers the errors to show, or null once saved. */
  onSubmit: (values: LineFormValues) => Promise<LineFormErrors | null>;
  onCancel: () => void;
}

/** A line's name and what it is made for; the first field opens focused, a refused one takes focus. */
export function LinesLineForm({ idPrefix, label, initial, submitLabel, onSubmit, onCancel }: LinesLineFormProps) {
  const formRef = useRef<HTMLFormElement>(null);
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<LineFormErrors>({});
  const [busy, setBusy] = useState(false);
  const [focusRequest, setFocusRequest] = useState(0);

  useEffect(() => {
    const form = formRef.current;
    const target = focusRequest === 0 ? form?.querySelector<HTMLElement>("input") : (form?.querySelector<HTMLElement>('[aria-invalid="true"]') ?? form?.querySelector<HTMLElement>(`#${idPrefix}-error`));
    target?.focus();
  }, [focusRequest, idPrefix]);

  const set = <F extends LineField>(field: F, value: LineFormValues[F]) => setValues((current) => ({ ...current, [field]: value }));

  async function submit(event: FormEvent) {
    event.preventDefault();
    setBusy(true);
    const refused = await onSubmit(values);
    setBusy(false);
    if (refused) {
      setErrors(refused);
      setFocusRequest((count) => count + 1);
    }
  }

  const field = (name: LineField) => ({ id: `${idPrefix}-${name}`, error: errors[name] });
  return (
    <form ref={formRef} onSubmit={submit} noValidate aria-label={label} className="grid gap-3 rounded border border-rule bg-paper p-3 sm:grid-cols-2 sm:p-4">
      <div className="sm:col-span-2">
        <FormField {...field("name")} label="Line name">
          {(control) => <input {...control} value={values.name} onChange={(event) => set("name", event.target.value)} autoComplete="off" className={itemInputClass} />}
        </FormField>
      </div>
      <FormField {...field("season")} label="Season">
        {(control) => (
          <select {...control} value={values.season} onChange={(event) => set("season", event.target.value as Season)} className={itemInputClass}>
            {SEASONS.map((season) => (
              <option key={season}>{season}</option>
            ))}
          </select>
        )}
      </FormField>
      <FormField {...field("terrain")} label="Terrain">
        {(control) => (
          <select {...control} value={values.terrain} onChange={(event) => set("terrain", event.target.value as Terrain)} className={itemInputClass}>
            {TERRAINS.map((terrain) => (
              <option key={terrain}>{terrain}</option>
            ))}
          </select>
        )}
      </FormField>
      <FormField {...field("treadDepth32")} label="New tread depth (32nds of an inch, optional)" hint="Passenger tires are commonly 10 to 12; leave empty if unknown.">
        {(control) => (
          <input {...control} value={values.treadDepth32} onChange={(event) => set("treadDepth32", event.target.value)} inputMode="numeric" autoComplete="off" className={`${itemInputClass} font-mono`} />
        )}
      </FormField>
      <label className="flex min-h-11 items-center gap-3 self-end font-semibold">
        <input type="checkbox" checked={values.threePeak} onChange={(event) => set("threePeak", event.target.checked)} className="size-5 accent-accent" />
        Three-peak mountain snowflake (3PMSF)
      </label>
      <p id={`${idPrefix}-error`} tabIndex={-1} role="alert" className="text-danger sm:col-span-2">
        {errors.form ?? ""}
      </p>
      <div className="flex flex-wrap gap-2 sm:col-span-2">
        <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90 disabled:opacity-60">
          {busy ? "Saving…" : submitLabel}
        </button>
        <button type="button" onClick={onCancel} disabled={busy} className="min-h-11 rounded border border-rule px-4 font-semibold disabled:opacity-60">
          Cancel
        </button>
      </div>
    </form>
  );
}
