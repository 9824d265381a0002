import { randomBytes } from "node:crypto";

/** 18 random bytes: 144 bits, above the 128 a link that cannot be guessed needs. */
export const SLUG_BYTES = 18;

/** A Fit card's address: random, URL-safe, 24 characters; never a counter or a hash of the card. */
export function newFitCardSlug(): string {
  return randomBytes(SLUG_BYTES).toString("base64url");
}
