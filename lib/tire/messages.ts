import { LOAD_INDEX_MAX, LOAD_INDEX_MIN } from "./load-index";

/** The words every request that names a tire answers with when a part of it cannot be read. */
export const SIZE_REQUIRED = "give the size on the tire, e.g. 285-50R20";

export const notASizeMessage = (text: string): string => `"${text.slice(0, 40)}" is not a tire size (try 285/50R20 or 285-50R20).`;

export const unknownLoadIndexMessage = (index: number): string => `Load index ${index} is not in the load index table (${LOAD_INDEX_MIN}–${LOAD_INDEX_MAX}).`;

export const unknownSpeedSymbolMessage = (text: string): string => `"${text.slice(0, 8)}" is not a speed symbol.`;
