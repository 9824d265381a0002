import { randomBytes } from "node:crypto";

/** 24 random bytes (192 bits) as base64url: 32 characters no one can guess, safe in a URL path. */
export const newOfferToken = (): string => randomBytes(24).toString("base64url");
