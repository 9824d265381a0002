/** Words the catalog, the finder and the forms share; browser-safe, so every layer may import them. */

export const SEASONS = ["all-season", "all-weather", "summer", "winter"] as const;
export type Season = (typeof SEASONS)[number];

export const TERRAINS = ["highway", "all-terrain", "mud-terrain"] as const;
export type Terrain = (typeof TERRAINS)[number];

/** The Replacement finder's orders: nearest diameter, lowest price, most load capacity to spare. */
export const FINDER_SORTS = ["diameter", "price", "loadMargin"] as const;
export type FinderSort = (typeof FINDER_SORTS)[number];

/**
 * A SKU survives a URL path as it is (RFC 3986 §2.3 unreserved characters, "~" aside), so every
 * item opens at /counter/items/{sku}: 1–64 of A–Z a–z 0–9 - _ . but never "." or ".." alone (path
 * segments a URL resolver removes, RFC 3986 §5.2.4), and never "new" in any case, the address of
 * the form that adds an item. The database's check is written from the same parts.
 */
export const SKU_CHARACTERS = "A-Za-z0-9._-";
export const SKU_MAX_LENGTH = 64;
export const SKU_PATTERN = new RegExp(`^(?!\\.\\.?$)(?![Nn][Ee][Ww]$)[${SKU_CHARACTERS}]{1,${SKU_MAX_LENGTH}}$`);
export const SKU_RULE = 'a SKU is 1–64 letters, digits, dots, hyphens or underscores (not "." or ".." alone, and not "new")';

export const isSku = (text: string): boolean => SKU_PATTERN.test(text);
