"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState, type FormEvent } from "react";
import type { ListedBrand } from "@/lib/brands/brand-bodies";
import { LINES_PAGE_PATH } from "@/lib/brands/line-words";
import { FormField } from "@/components/ui/form-field";
import { itemInputClass, useHydrated } from "./item-controls";
import { checkItemForm } from "./item-form-check";
import { ITEM_FIELDS, sendCatalogWrite, type ItemField as Field, type ItemFormErrors, type ItemFormValues } from "./item-form-values";
import { ItemSizePreview } from "./item-size-preview";

interface ItemFormProps {
  brands: readonly ListedBrand[];
  initial: ItemFormValues;
  /** The SKU being edited; absent for a new item. */
  sku?: string;
}

const TEXT_FIELDS: { name: Exclude<Field, "sku" | "brand" | "line" | "designation" | "extraLoad" | "treadDepth32">; label: string; inputMode: "numeric" | "decimal" | "text" }[] = [
  { name: "loadIndex", label: "Load index", inputMode: "numeric" },
  { name: "loadIndexDual", label: "Dual load index (optional)", inputMode: "numeric" },
  { name: "speedSymbol", label: "Speed symbol", inputMode: "text" },
  { name: "loadRange", label: "Load range (LT only, e.g. E)", inputMode: "text" },
  { name: "priceCents", label: "Price (US dollars)", inputMode: "decimal" },
  { name: "quantity", label: "Quantity on hand", inputMode: "numeric" },
];

/** Adds or edits a stock item through the catalog API, checking each field in the browser first. */
export function ItemForm({ brands, initial, sku }: ItemFormProps) {
  const router = useRouter();
  const formRef = useRef<HTMLFormElement>(null);
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<ItemFormErrors>({});
  const [focusRequest, setFocusRequest] = useState(0);
  const [busy, setBusy] = useState(false);
  const hydrated = useHydrated();
  const isNew = sku === undefined;
  const lines = brands.find((brand) => brand.name === values.brand)?.lines ?? [];
  const lineDepth = lines.find((line) => line.name === values.line)?.treadDepth32 ?? null;
  // A retired line takes no new items; an item already on one may stay there.
  const offered = (line: ListedBrand["lines"][number]) => !line.retired || (!isNew && values.brand === initial.brand && line.name === initial.line);

  useEffect(() => {
    if (focusRequest === 0) return;
    const form = formRef.current;
    (form?.querySelector<HTMLElement>('[aria-invalid="true"]') ?? form?.querySelector<HTMLElement>("#item-form-error"))?.focus();
  }, [focusRequest]);

  const set = (name: Field, value: string | boolean) => setValues((current) => ({ ...current, [name]: value }));
  const refuse = (next: ItemFormErrors) => {
    setErrors(next);
    setFocusRequest((count) => count + 1);
  };

  async function submit(event: FormEvent) {
    event.preventDefault();
    const checked = checkItemForm(values, { isNew });
    if (!checked.ok) return refuse(checked.errors);
    setErrors({});
    setBusy(true);
    const { sku: newSku, ...changes } = checked.body;
    const path = `/api/v1/catalog${isNew ? "" : `/${encodeURIComponent(sku)}`}`;
    const result = await sendCatalogWrite(isNew ? "POST" : "PATCH", path, isNew ? checked.body : changes);
    if (result.ok) {
      const saved = isNew ? newSku : sku;
      router.push(`/counter?q=${encodeURIComponent(saved)}&${isNew ? "added" : "saved"}=${encodeURIComponent(saved)}`);
      return;
    }
    setBusy(false);
    const field = ITEM_FIELDS.find((name) => name === result.field);
    refuse(field ? { [field]: result.message } : { form: result.message });
  }

  const field = (name: Field) => ({ id: `item-${name}`, error: errors[name] });
  return (
    <form ref={formRef} noValidate onSubmit={submit} aria-label={isNew ? "New item" : `Edit ${sku}`} className="grid max-w-3xl gap-4 rounded border border-rule bg-sheet p-4 sm:grid-cols-2 sm:p-6">
      {/* Typing before the page is hydrated could be lost, so the fields wait for it. */}
      <fieldset disabled={!hydrated} className="contents">
        {isNew ? (
          <FormField {...field("sku")} label="SKU">
            {(control) => <input {...control} name="sku" value={values.sku} onChange={(e) => set("sku", e.target.value)} autoComplete="off" className={`${itemInputClass} font-mono`} />}
          </FormField>
        ) : null}
        <FormField
          {...field("brand")}
          label="Brand"
          hint={
            <>
              A brand or line missing, or retired?{" "}
              <Link href={LINES_PAGE_PATH} prefetch={false} className="font-semibold text-accent underline underline-offset-2">
                Add it on the Lines page
              </Link>
            </>
          }
        >
          {(control) => (
            <select {...control} name="brand" value={values.brand} onChange={(e) => setValues((current) => ({ ...current, brand: e.target.value, line: "" }))} className={itemInputClass}>
              <option value="">Choose a brand</option>
              {brands.map((brand) => (
                <option key={brand.name}>{brand.name}</option>
              ))}
            </select>
          )}
        </FormField>
        <FormField {...field("line")} label="Line">
          {(control) => (
            <select {...control} name="line" value={values.line} onChange={(e) => set("line", e.target.value)} className={itemInputClass}>
              <option value="">{values.brand ? "Choose a line" : "Choose a brand first"}</option>
              {lines.map((line) => (
                <option key={line.id} value={line.name} disabled={!offered(line)}>
                  {line.retired ? `${line.name} (retired)` : line.name}
                </option>
              ))}
            </select>
          )}
        </FormField>
        <div className="sm:col-span-2">
          <FormField {...field("designation")} label="Size" hintId="item-size-reading" hint={<ItemSizePreview id="item-size-reading" text={values.designation} />}>
            {(control) => (
              <input {...control} name="designation" value={values.designation} onChange={(e) => set("designation", e.target.value)} autoComplete="off" spellCheck={false} className={`${itemInputClass} font-mono`} />
            )}
          </FormField>
        </div>
        {TEXT_FIELDS.map(({ name, label, inputMode }) => (
          <FormField key={name} {...field(name)} label={label}>
            {(control) => <input {...control} name={name} value={values[name]} inputMode={inputMode} autoComplete="off" onChange={(e) => set(name, e.target.value)} className={`${itemInputClass} font-mono`} />}
          </FormField>
        ))}
        <FormField
          {...field("treadDepth32")}
          label="Tread depth, new (32nds, optional)"
          hint={lineDepth === null ? "Leave empty unless this size differs from its line." : `Leave empty to use the line's ${lineDepth}/32 in.`}
        >
          {(control) => (
            <input {...control} name="treadDepth32" value={values.treadDepth32} inputMode="numeric" autoComplete="off" onChange={(e) => set("treadDepth32", e.target.value)} className={`${itemInputClass} font-mono`} />
          )}
        </FormField>
        <div className="flex flex-col gap-1 sm:col-span-2">
          <label className="flex min-h-11 items-center gap-3 font-semibold">
            <input type="checkbox" name="extraLoad" checked={values.extraLoad} onChange={(e) => set("extraLoad", e.target.checked)}
              aria-invalid={errors.extraLoad ? true : undefined} aria-describedby={errors.extraLoad ? "item-extraLoad-error" : undefined} className="size-5 accent-accent" />
            Extra load (XL, passenger tires only)
          </label>
          {errors.extraLoad ? <p id="item-extraLoad-error" className="text-sm text-danger">{errors.extraLoad}</p> : null}
        </div>
      </fieldset>
      <p id="item-form-error" tabIndex={-1} role="alert" className="text-danger sm:col-span-2">
        {errors.form ?? ""}
      </p>
      <div className="flex flex-wrap items-center gap-4 sm:col-span-2">
        <button type="submit" disabled={busy || !hydrated} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90 disabled:opacity-60">
          {busy ? "Saving…" : isNew ? "Add this item" : "Save changes"}
        </button>
      </div>
    </form>
  );
}
