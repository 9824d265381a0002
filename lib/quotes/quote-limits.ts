/** Ask the shop's limits, shared by the API's checks and the browser's forms (which ship no zod). */

export const MIN_QUANTITY = 1;
export const MAX_QUANTITY = 16;
export const DEFAULT_QUANTITY = 4;
export const PREFERRED_DAY_MAX_AHEAD = 90;
/** The field no person sees: anything typed into it came from a script. */
export const HONEYPOT_FIELD = "website";
