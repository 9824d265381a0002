/** A count or an index typed as digits only; null for anything else. */
export function parseWholeNumber(text: string): number | null {
  return /^\d{1,9}$/.test(text.trim()) ? Number(text.trim()) : null;
}

export type CatalogWriteResult = { ok: true; body: unknown } | { ok: false; field: string | null; message: string };

/**
 * Sends a write to a JSON route of the API (the catalog's, the shop's) and reads its answer, or its
 * refusal: the message to show and the field it names (the API's `field`), if any.
 */
export async function sendCatalogWrite(method: "POST" | "PATCH" | "DELETE", path: string, body?: unknown): Promise<CatalogWriteResult> {
  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, field: null, message: "The shop's server could not be reached. Check the connection and try again." };
  }
  if (response.ok) return { ok: true, body: response.status === 204 ? null : await response.json().catch(() => null) };
  const refusal = (await response.json().catch(() => null)) as { error?: { message?: string; field?: string } } | null;
  return { ok: false, field: refusal?.error?.field ?? null, message: refusal?.error?.message ?? `The server answered ${response.status}. Try again.` };
}

/** The item form's fields, named as the catalog API names them (the price is typed in dollars). */
export const ITEM_FIELDS = [
  "sku", "brand", "line", "designation", "loadIndex", "loadIndexDual", "speedSymbol", "loadRange", "extraLoad", "priceCents", "quantity", "treadDepth32",
] as const;
export type ItemField = (typeof ITEM_FIELDS)[number];

export type ItemFormValues = Record<Exclude<ItemField, "extraLoad">, string> & { extraLoad: boolean };
export type ItemFormErrors = Partial<Record<ItemField | "form", string>>;
