/** A Fit card's limits, shared by the API's checks and the browser's forms (which ship no zod). */

export const MAX_CARD_TIRES = 6;
export const MAX_NOTE_LENGTH = 1000;
