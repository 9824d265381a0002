"use client";

import { useRouter } from "next/navigation";
import { useEffect, useRef, useState, type FormEvent, type ReactNode } from "react";
import { FormField } from "@/components/ui/form-field";
import { describeSettingChanges } from "@/lib/shop/settings-changes";
import type { ShopSettings } from "@/lib/shop/settings-schema";
import { HIGH_TAX_RATE_BP } from "@/lib/shop/limits";
import { parseTaxPercent } from "@/lib/shop/tax-percent";
import { itemInputClass, useHydrated } from "./item-controls";
import { sendCatalogWrite } from "./item-form-values";
import { CHARGE_FIELDS, checkShopForm, FITTING_FIELDS, formFieldOf, formValuesOf, type ShopFormErrors, type ShopFormValues } from "./shop-form-values";
import { ShopClosedDates } from "./shop-closed-dates";
import { ShopHoursEditor } from "./shop-hours-editor";
import { ShopTimeZoneField } from "./shop-time-zone-field";

type TextField = "name" | "streetAddress" | "town" | "region" | "postalCode" | "phone" | "email";

const CONTACT_FIELDS: { name: TextField; field: string; label: string; autoComplete: string; type?: string }[] = [
  { name: "name", field: "name", label: "Shop name", autoComplete: "organization" },
  { name: "streetAddress", field: "address.streetAddress", label: "Street address", autoComplete: "street-address" },
  { name: "town", field: "address.town", label: "Town", autoComplete: "address-level2" },
  { name: "region", field: "address.region", label: "Region (state)", autoComplete: "address-level1" },
  { name: "postalCode", field: "address.postalCode", label: "Postal code", autoComplete: "postal-code" },
  { name: "phone", field: "phone", label: "Phone", autoComplete: "tel", type: "tel" },
  { name: "email", field: "email", label: "E-mail", autoComplete: "email", type: "email" },
];

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="flex min-w-0 flex-col gap-4 rounded border border-rule bg-sheet p-4 sm:p-6">
      <legend className="px-1 text-xl font-semibold">{title}</legend>
      {children}
    </fieldset>
  );
}

/** The shop's settings, saved through PATCH /api/v1/shop with only what changed, then read out in words. */
export function ShopSettingsForm({ initial, timeZones }: { initial: ShopSettings; timeZones: readonly string[] }) {
  const router = useRouter();
  const formRef = useRef<HTMLFormElement>(null);
  const hydrated = useHydrated();
  const [saved, setSaved] = useState(initial);
  const [values, setValues] = useState<ShopFormValues>(() => formValuesOf(initial));
  const [errors, setErrors] = useState<ShopFormErrors>({});
  const [status, setStatus] = useState("");
  const [busy, setBusy] = useState(false);
  const [focusRequest, setFocusRequest] = useState(0);

  useEffect(() => {
    if (focusRequest === 0) return;
    const form = formRef.current;
    (form?.querySelector<HTMLElement>('[aria-invalid="true"]') ?? form?.querySelector<HTMLElement>("#shop-form-error"))?.focus();
  }, [focusRequest]);

  const set = <K extends keyof ShopFormValues>(name: K, value: ShopFormValues[K]) => setValues((current) => ({ ...current, [name]: value }));
  const refuse = (next: ShopFormErrors) => {
    setErrors(next);
    setStatus("");
    setFocusRequest((count) => count + 1);
  };

  async function submit(event: FormEvent) {
    event.preventDefault();
    const checked = checkShopForm(values, saved);
    if (!checked.ok) return refuse({ ...checked.errors, form: "Nothing was saved: correct the marked fields." });
    setErrors({});
    if (!checked.body) return setStatus("Nothing to save: the settings are as they were.");
    setBusy(true);
    const result = await sendCatalogWrite("PATCH", "/api/v1/shop", checked.body);
    setBusy(false);
    if (!result.ok) {
      const field = formFieldOf(result.field);
      return refuse(field === "form" ? { form: result.message } : { [field]: result.message, form: "Nothing was saved: correct the marked field." });
    }
    const after = result.body as ShopSettings;
    setSaved(after);
    setValues(formValuesOf(after));
    setStatus(`Saved: ${describeSettingChanges(checked.changes)}.`);
    // The footer's hours and contact come from the server: show the new ones.
    router.refresh();
  }

  const field = (name: string) => ({ id: `shop-${name.replace(".", "-")}`, error: errors[name] });
  const taxRateBp = parseTaxPercent(values.taxPercent);
  const taxHint = taxRateBp !== null && taxRateBp > HIGH_TAX_RATE_BP ? "Above 15 % is more than US state and local sales taxes add up to anywhere: check the rate." : "Like 7.25 for 7.25 %.";
  return (
    <form ref={formRef} noValidate onSubmit={submit} aria-label="Shop settings" className="flex max-w-3xl flex-col gap-6">
      <fieldset disabled={!hydrated} className="contents">
        <Section title="Contact">
          <div className="grid gap-4 sm:grid-cols-2">
            {CONTACT_FIELDS.map(({ name, field: apiField, label, autoComplete, type }) => (
              <FormField key={name} {...field(apiField)} label={label}>
                {(control) => <input {...control} name={name} type={type ?? "text"} value={values[name]} autoComplete={autoComplete} onChange={(e) => set(name, e.target.value)} className={itemInputClass} />}
              </FormField>
            ))}
          </div>
        </Section>
        <Section title="Time and opening hours">
          <ShopTimeZoneField value={values.timeZone} zones={timeZones} error={errors.timeZone} onChange={(zone) => set("timeZone", zone)} />
          <p className="text-sm text-ink-soft">Opening hours are in the shop&apos;s time zone, on a 24-hour clock. Add hours after a break for a lunch break.</p>
          <ShopHoursEditor hours={values.hours} errors={errors} onChange={(hours) => set("hours", hours)} />
        </Section>
        <Section title="Closed dates">
          <ShopClosedDates dates={values.closedDates} error={errors.closedDates} onChange={(dates) => set("closedDates", dates)} />
        </Section>
        <Section title="Finder and charges">
          <div className="grid gap-4 sm:grid-cols-2">
            <FormField {...field("tolerancePct")} label="Default diameter tolerance (%)" hint="1 to 5; a search may choose its own.">
              {(control) => <input {...control} name="tolerancePct" inputMode="decimal" value={values.tolerancePct} onChange={(e) => set("tolerancePct", e.target.value)} autoComplete="off" className={`${itemInputClass} font-mono`} />}
            </FormField>
            <FormField {...field("wearLimit32")} label="Wear match's default limit (32nds of an inch)" hint="Tread depth allowed between any two tires on an all-wheel-drive vehicle when its maker states none; 2 is common practice.">
              {(control) => <input {...control} name="wearLimit32" inputMode="decimal" value={values.wearLimit32} onChange={(e) => set("wearLimit32", e.target.value)} autoComplete="off" className={`${itemInputClass} font-mono`} />}
            </FormField>
            {CHARGE_FIELDS.map(({ value, field: apiField, label }) => (
              <FormField key={value} {...field(apiField)} label={`${label} (US dollars)`}>
                {(control) => <input {...control} name={value} inputMode="decimal" value={values[value]} onChange={(e) => set(value, e.target.value)} autoComplete="off" className={`${itemInputClass} font-mono`} />}
              </FormField>
            ))}
            <FormField {...field("taxRateBp")} label="Sales tax rate (%)" hint={<span aria-live="polite">{taxHint}</span>}>
              {(control) => <input {...control} name="taxPercent" inputMode="decimal" value={values.taxPercent} onChange={(e) => set("taxPercent", e.target.value)} autoComplete="off" className={`${itemInputClass} font-mono`} />}
            </FormField>
          </div>
          <label className="flex min-h-11 items-center gap-3 font-semibold">
            <input type="checkbox" name="taxServices" checked={values.taxServices} onChange={(e) => set("taxServices", e.target.checked)} className="size-5 accent-accent" />
            Charge sales tax on fitting and disposal too
          </label>
        </Section>
        <Section title="Fittings">
          <p className="text-sm text-ink-soft">How drivers book a fitting when they accept an offer: bays, times and the cut-off for cancelling online.</p>
          <div className="grid gap-4 sm:grid-cols-2">
            {FITTING_FIELDS.map(({ field: apiField, label, hint }) => (
              <FormField key={apiField} {...field(apiField)} label={label} hint={hint}>
                {(control) => <input {...control} name={apiField} inputMode="numeric" value={values[apiField]} onChange={(e) => set(apiField, e.target.value)} autoComplete="off" className={`${itemInputClass} font-mono`} />}
              </FormField>
            ))}
          </div>
        </Section>
      </fieldset>
      <p id="shop-form-error" tabIndex={-1} role="alert" className="text-danger">
        {errors.form ?? ""}
      </p>
      <div className="flex flex-wrap items-center gap-4">
        <button type="submit" disabled={busy || !hydrated} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90 disabled:opacity-60">
          {busy ? "Saving…" : "Save settings"}
        </button>
        <p role="status" className="font-semibold">
          {status}
        </p>
      </div>
    </form>
  );
}
