/**
 * What every write path (the item form and the catalog API, the CSV import and its preview) says
 * about a brand or line it cannot use, in the words of a CSV refusal (lower case, no full stop);
 * `asSentence` makes one of the API's messages of it. Pure: the browser's preview uses it too.
 */

/** Where staff add brands and lines, and retire or un-retire lines. */
export const LINES_PAGE_PATH = "/counter/lines";
const LINES_PAGE = "the Lines page (Counter → Lines)";

export const unknownBrandReason = (brandName: string) =>
  `the catalog has no brand "${brandName}"; add it on ${LINES_PAGE}, or correct the name`;

export const unknownLineReason = (brandName: string, lineName: string) =>
  `the brand "${brandName}" has no line "${lineName}"; add it on ${LINES_PAGE}, or correct the name`;

/** `lineLabel` is the brand and line as the catalog spells them ("Quensal Aldermoor Tour"). */
export const retiredLineReason = (lineLabel: string) =>
  `the line "${lineLabel}" is retired and takes no new items; un-retire it on ${LINES_PAGE}, or pick another line`;

export const asSentence = (reason: string) => `${reason.charAt(0).toUpperCase()}${reason.slice(1)}.`;
