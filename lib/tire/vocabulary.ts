/**
 * Words the catalog, the finder, the Counter and the forms share, each written once; browser-safe and
 * free of any import, so that db/, lib/ and client components may all use them.
 */

/** R radial, D diagonal (bias), B bias-belted. */
export const CONSTRUCTIONS = ["R", "D", "B"] as const;

/** The families a replacement must stay within: passenger, light truck, ETRTO commercial, trailer, temporary spare. */
export const SERVICE_TYPES = ["passenger", "LT", "C", "ST", "T"] as const;

export const SEASONS = ["all-season", "all-weather", "summer", "winter"] as const;
export type Season = (typeof SEASONS)[number];

export const TERRAINS = ["highway", "all-terrain", "mud-terrain"] as const;
export type Terrain = (typeof TERRAINS)[number];

/**
 * A new tire's tread depth, in whole 32nds of an inch, as a line or an item states it. New passenger
 * tires are commonly about 10/32 to 12/32 in deep, light-truck, all-terrain and mud-terrain tires
 * deeper (about 15/32 to 20/32), and a temporary spare shallower (about 6/32) (common practice). The
 * range is wide on purpose: 2/32 is where most US states call a tire worn out, so no new tire is
 * shallower, and 40/32 (1¼ in, also the database's upper bound) leaves room for specialty off-road
 * tread while still catching a depth typed in millimetres or 64ths.
 */
export const TREAD_DEPTH32_MIN = 2;
export const TREAD_DEPTH32_MAX = 40;

/** The Replacement finder's orders: nearest diameter, lowest price, most load capacity to spare. */
export const FINDER_SORTS = ["diameter", "price", "loadMargin"] as const;
export type FinderSort = (typeof FINDER_SORTS)[number];

/** The most alternatives one request may ask for. */
export const MAX_ALTERNATIVES_PAGE = 500;

/**
 * How many tires a driver needs at once: the API takes 1–8 (default 4: a set), the finder offers the
 * usual counts (one, an axle, a set, a truck with rear duals).
 */
export const MIN_SET_SIZE = 1;
export const MAX_SET_SIZE = 8;
export const DEFAULT_SET_SIZE = 4;
export const SET_SIZE_CHOICES = [1, 2, 4, 6] as const;

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

/** Roles, each including everything the one before it may do. */
export const ROLES = ["customer", "staff", "admin"] as const;
export type Role = (typeof ROLES)[number];

/** Whether a role may do what `needed` may: admin includes staff, staff includes customer. An unknown role grants nothing. */
export function hasRole(role: string | null | undefined, needed: Role): boolean {
  const rank = ROLES.indexOf(role as Role);
  return rank >= 0 && rank >= ROLES.indexOf(needed);
}

/** Who may save a Fit card: anyone signed in (the pages show "Save as Fit card" only to them). */
export const SAVE_FIT_CARD_ROLE: Role = "customer";

export const QUOTE_STATUSES = ["new", "answered", "offered", "closed"] as const;
export type QuoteStatus = (typeof QUOTE_STATUSES)[number];

/** Where an Ask the shop request was sent from. */
export const QUOTE_SOURCES = ["fit-card", "size-sheet", "finder", "compare", "plus", "counter"] as const;
export type QuoteSource = (typeof QUOTE_SOURCES)[number];

export const AUDIT_ACTIONS = [
  "item_added", "item_changed", "item_retired", "catalog_import", "role_changed", "shop_changed",
  "brand_added", "brand_renamed", "line_added", "line_changed", "fit_card_emailed", "request_replied",
  "offer_sent", "offer_withdrawn", "fitting_fitted", "fitting_no_show", "fitting_cancelled",
] as const;

/**
 * Where a priced offer stands. Stored: open, accepted (a fitting booked, the tires held), withdrawn
 * (by staff), cancelled (by the driver, or by staff before the fitting), no-show, fitted. "expired"
 * is never stored: an open offer past its valid-until instant reads as expired.
 */
export const OFFER_STATUSES = ["open", "accepted", "expired", "withdrawn", "cancelled", "no-show", "fitted"] as const;
export type OfferStatus = (typeof OFFER_STATUSES)[number];
export type StoredOfferStatus = Exclude<OfferStatus, "expired">;
/** What staff mark a booked fitting as at the counter. */
export const FITTING_OUTCOMES = ["fitted", "no-show", "cancelled"] as const;
export type FittingOutcome = (typeof FITTING_OUTCOMES)[number];
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

/** The days of a week of opening hours, Monday first. */
export const WEEKDAYS = ["mon", "tue", "wed", "thu", "fri", "sat", "sun"] as const;
export type Weekday = (typeof WEEKDAYS)[number];
/** Opening intervals per day as ["HH:MM", "HH:MM"] in the shop's time zone; a lunch break is two intervals, an empty list is closed. */
export type WeeklyHours = Record<Weekday, [string, string][]>;

/** Hours a shop starts with until its admin sets its own. */
export const DEFAULT_WEEKLY_HOURS: WeeklyHours = {
  mon: [["08:00", "17:00"]],
  tue: [["08:00", "17:00"]],
  wed: [["08:00", "17:00"]],
  thu: [["08:00", "17:00"]],
  fri: [["08:00", "17:00"]],
  sat: [["08:00", "12:00"]],
  sun: [],
};
