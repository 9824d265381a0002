import type { NewStockItemBody } from "@/lib/stock/item-bodies";
import { buildStockRow } from "@/lib/stock/build-stock-row";
import { parseDollars } from "@/lib/money/money";
import { treadDepth32Schema } from "@/lib/validation/tread-depth";
import { parseWholeNumber, type ItemField, type ItemFormErrors, type ItemFormValues } from "./item-form-values";

export type ItemFormCheck = { ok: true; body: NewStockItemBody } | { ok: false; errors: ItemFormErrors };

// The line is not known in the browser; the server checks run-flat against the real one.
const PLACEHOLDER_LINE = { id: 0, runFlat: false };
const PLACEHOLDER_SKU = "EDITED-ITEM";

const sentence = (text: string) => `${text.charAt(0).toUpperCase()}${text.slice(1)}${/[.!?]$/.test(text) ? "" : "."}`;

/**
 * Checks the form as the server will, before anything is sent: each field that cannot be read gets
 * its own message, then the tire core reads the whole item (the first problem it finds is named).
 */
export function checkItemForm(values: ItemFormValues, { isNew }: { isNew: boolean }): ItemFormCheck {
  const errors: ItemFormErrors = {};
  const required = (field: ItemField, what: string) => {
    if (String(values[field]).trim() === "") errors[field] = `Enter ${what}.`;
  };
  if (isNew) required("sku", "the SKU");
  required("brand", "a brand");
  required("line", "a line");
  required("designation", "the size, like 225/45R17");
  required("speedSymbol", "the speed symbol, like H");
  const loadIndex = parseWholeNumber(values.loadIndex);
  if (loadIndex === null) errors.loadIndex = "Enter the load index as a whole number, like 91.";
  const dualText = values.loadIndexDual.trim();
  const loadIndexDual = dualText === "" ? null : parseWholeNumber(dualText);
  if (loadIndexDual === null && dualText !== "") errors.loadIndexDual = "Enter the dual load index as a whole number, or leave it empty.";
  const priceCents = parseDollars(values.priceCents);
  if (priceCents === null) errors.priceCents = "Enter the price in dollars, like 189.99.";
  const quantity = parseWholeNumber(values.quantity);
  if (quantity === null) errors.quantity = "Enter how many are on hand, 0 or more.";
  const depthText = values.treadDepth32.trim();
  const depth = depthText === "" ? null : treadDepth32Schema.safeParse(parseWholeNumber(depthText));
  if (depth && !depth.success) errors.treadDepth32 = sentence(depth.error.issues[0]?.message ?? "give the tread depth in 32nds of an inch");
  if (Object.keys(errors).length > 0 || loadIndex === null || priceCents === null || quantity === null) return { ok: false, errors };

  const body: NewStockItemBody = {
    sku: values.sku.trim(),
    brand: values.brand.trim(),
    line: values.line.trim(),
    designation: values.designation.trim(),
    loadIndex,
    loadIndexDual,
    speedSymbol: values.speedSymbol.trim(),
    loadRange: values.loadRange.trim() === "" ? null : values.loadRange.trim(),
    extraLoad: values.extraLoad,
    priceCents,
    quantity,
    treadDepth32: depth?.data ?? null,
  };
  const built = buildStockRow({ ...body, sku: isNew ? body.sku : PLACEHOLDER_SKU }, PLACEHOLDER_LINE);
  if (!built.ok) return { ok: false, errors: { [built.problem.field]: sentence(built.problem.reason) } };
  return { ok: true, body };
}
