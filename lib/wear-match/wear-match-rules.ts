/** The bounds Wear match accepts, shared by the API, the page's form and the Counter's settings. */

/** Deeper than any passenger or light-truck tread (common practice: new tread is about 8/32–20/32 in). */
export const MAX_TREAD_DEPTH_32 = 32;
/** Replacing one or two of four tires leaves three or two on the vehicle. */
export const STAYING_TIRES_MIN = 2;
export const STAYING_TIRES_MAX = 3;
/** The largest depth-difference limit a shop or a request may name, in 32nds. */
export const WEAR_LIMIT_32_MAX = 8;
/** The largest circumference-difference limit, in millimetres (8/32 in of depth is about 40 mm of circumference). */
export const WEAR_LIMIT_MM_MAX = 50;
/** A depth or limit in 32nds as typed: whole or a half ("6", "6.5"). */
export const HALF_32NDS_PATTERN = /^\d+(\.[05])?$/;
