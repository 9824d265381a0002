"use client";

import { useState } from "react";
import { fieldClass, FormField } from "@/components/ui/form-field";
import { findOfferTire } from "@/lib/offers/actions";
import { MAX_LINE_QUANTITY, MAX_OFFER_LINES } from "@/lib/offers/offer-input";
import type { OfferTire } from "@/lib/offers/offer-tire";
import { formatPrice } from "@/lib/money/money";

/** A tire the composer lists: included in the offer or not, and how many. */
export interface ComposerLine {
  tire: OfferTire;
  included: boolean;
  quantity: number;
}

const QUANTITIES = Array.from({ length: MAX_LINE_QUANTITY }, (_, index) => index + 1);

/** The composer's tires: a checkbox and a quantity each, a warning where fewer can be sold now, and a SKU field that adds others. */
export function OfferLines({ lines, quantity, error, onChange }: { lines: ComposerLine[]; quantity: number; error?: string; onChange: (lines: ComposerLine[]) => void }) {
  const [sku, setSku] = useState("");
  const [skuError, setSkuError] = useState<string | undefined>();
  const [looking, setLooking] = useState(false);
  const change = (index: number, patch: Partial<ComposerLine>) => onChange(lines.map((line, at) => (at === index ? { ...line, ...patch } : line)));

  async function addSku() {
    const wanted = sku.trim();
    if (lines.some((line) => line.tire.sku === wanted)) {
      setSkuError(`${wanted} is already listed: tick it and set its quantity.`);
      return;
    }
    if (lines.length >= MAX_OFFER_LINES) {
      setSkuError(`An offer lists at most ${MAX_OFFER_LINES} tires: to offer alternatives, send two offers.`);
      return;
    }
    setLooking(true);
    const found = await findOfferTire({ sku: wanted });
    setLooking(false);
    if (!found.ok) {
      setSkuError(found.fieldErrors?.sku ?? found.message);
      return;
    }
    setSkuError(undefined);
    setSku("");
    onChange([...lines, { tire: found.data, included: true, quantity }]);
  }

  return (
    <fieldset className="flex flex-col gap-3" aria-describedby={error ? "offer-lines-error" : undefined}>
      <legend className="font-semibold">Tires in the offer</legend>
      {lines.length === 0 ? <p className="text-ink-soft">The request names no catalog tire: add one by its SKU.</p> : null}
      <ul className="flex flex-col gap-2">
        {lines.map((line, index) => {
          const short = line.included && line.quantity > line.tire.sellable;
          const id = `offer-line-${index}`;
          return (
            <li key={line.tire.sku} data-sku={line.tire.sku} className="flex flex-wrap items-center gap-x-4 gap-y-2 rounded border border-rule bg-paper p-3">
              <label htmlFor={`${id}-on`} className="flex min-h-11 min-w-0 flex-1 basis-64 items-center gap-3">
                <input id={`${id}-on`} type="checkbox" checked={line.included} onChange={(event) => change(index, { included: event.target.checked })} className="size-5 shrink-0 accent-accent" />
                <span className="min-w-0">
                  <span className="block font-semibold break-words">{line.tire.label}</span>
                  <span className="block text-sm text-ink-soft">
                    SKU {line.tire.sku} · {formatPrice(line.tire.priceCents)} each · {line.tire.sellable} can be sold now
                  </span>
                </span>
              </label>
              <span className="flex items-center gap-2">
                <label htmlFor={`${id}-quantity`} className="text-sm font-semibold">
                  How many
                </label>
                <select
                  id={`${id}-quantity`}
                  value={line.quantity}
                  disabled={!line.included}
                  onChange={(event) => change(index, { quantity: Number(event.target.value) })}
                  aria-describedby={short ? `${id}-short` : undefined}
                  className="min-h-11 rounded border border-rule bg-sheet px-2 disabled:opacity-60"
                >
                  {QUANTITIES.map((count) => (
                    <option key={count} value={count}>
                      {count}
                    </option>
                  ))}
                </select>
              </span>
              {short ? (
                <p id={`${id}-short`} className="basis-full text-sm font-semibold text-ink">
                  Only {line.tire.sellable} can be sold now, fewer than the {line.quantity} offered. You may still send it: the driver can book only while the shop has them.
                </p>
              ) : null}
            </li>
          );
        })}
      </ul>
      {error ? (
        <p id="offer-lines-error" className="text-sm text-danger">
          {error}
        </p>
      ) : null}
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-0 flex-1 basis-48">
          <FormField id="offer-add-sku" label="Add another tire by SKU" error={skuError}>
            {(control) => (
              <input
                {...control}
                value={sku}
                onChange={(event) => setSku(event.target.value)}
                onKeyDown={(event) => {
                  if (event.key === "Enter") {
                    event.preventDefault();
                    void addSku();
                  }
                }}
                autoComplete="off"
                spellCheck={false}
                className={`${fieldClass} font-mono`}
              />
            )}
          </FormField>
        </div>
        <button type="button" onClick={() => void addSku()} disabled={looking || sku.trim() === ""} className="min-h-11 rounded border border-accent px-4 font-semibold text-accent disabled:opacity-60">
          {looking ? "Looking…" : "Add"}
        </button>
      </div>
    </fieldset>
  );
}
