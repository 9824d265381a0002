import { z } from "zod";

/**
 * A SKU survives a URL path as it is (RFC 3986 §2.3 unreserved characters, "~" aside), so every
 * item opens at /counter/items/{sku}: 1–64 of A–Z a–z 0–9 - _ . but never "." or ".." alone (path
 * segments a URL resolver removes, RFC 3986 §5.2.4), and never "new" in any case, the address of
 * the form that adds an item.
 */
export const SKU_PATTERN = /^(?!\.\.?$)(?![Nn][Ee][Ww]$)[A-Za-z0-9._-]{1,64}$/;

export const SKU_RULE = 'a SKU is 1–64 letters, digits, dots, hyphens or underscores (not "." or ".." alone, and not "new")';

export const skuSchema = z.string().regex(SKU_PATTERN, SKU_RULE);

export function isSku(text: string): boolean {
  return SKU_PATTERN.test(text);
}
