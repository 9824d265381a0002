import { createHmac, timingSafeEqual } from "node:crypto";
import { z } from "zod";
import { readAuthEnv } from "@/lib/auth/auth-env";
import { MIN_FILL_MS } from "./quote-input";
import { HONEYPOT_FIELD } from "./quote-limits";

/** A form older than this was not filled in by the person who opened it today. */
export const MAX_FORM_AGE_MS = 86_400_000;

const TOKEN_PATTERN = /^(\d{1,15})\.([A-Za-z0-9_-]{43})$/;

function signature(issuedAtMs: number, secret: string): Buffer {
  return createHmac("sha256", secret).update(`sidewise quote form opened at ${issuedAtMs}`).digest();
}

/** The 200 body of GET /api/v1/quote-requests/form-token. */
export const formTokenAnswerSchema = z.object({
  renderedAt: z.string().regex(TOKEN_PATTERN).describe("When the server handed the form out, signed; post it back as the request's renderedAt."),
});

export type FormTokenAnswer = z.infer<typeof formTokenAnswerSchema>;

/** The `renderedAt` a request form carries: when the server handed it out, signed with the app's secret. */
export function signFormToken(issuedAtMs: number, secret = readAuthEnv().secret): string {
  return `${issuedAtMs}.${signature(issuedAtMs, secret).toString("base64url")}`;
}

export type FormTokenVerdict = { ok: true } | { ok: false; reason: "not_signed" | "too_young" | "too_old" };

/**
 * Whether a request form was opened from this server at least 3 seconds and at most a day ago. The
 * time comes from the server's own signed token, so a script cannot claim to have waited.
 */
export function checkFormToken(token: string | undefined, now = Date.now(), secret = readAuthEnv().secret): FormTokenVerdict {
  const match = token ? TOKEN_PATTERN.exec(token) : null;
  if (!match) return { ok: false, reason: "not_signed" };
  const issuedAtMs = Number(match[1]);
  const given = Buffer.from(match[2]!, "base64url");
  const expected = signature(issuedAtMs, secret);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return { ok: false, reason: "not_signed" };
  const age = now - issuedAtMs;
  if (age < MIN_FILL_MS) return { ok: false, reason: "too_young" };
  if (age > MAX_FORM_AGE_MS) return { ok: false, reason: "too_old" };
  return { ok: true };
}

export type SpamVerdict = { ok: true } | { ok: false; reason: "honeypot" | "not_signed" | "too_young" | "too_old" };

/** Refuses what only a script would send: the hidden field filled in, or a form token that is missing, forged, too fresh or stale. */
export function spamVerdict(input: { [HONEYPOT_FIELD]?: string; renderedAt?: string }, now = Date.now(), secret = readAuthEnv().secret): SpamVerdict {
  if (input[HONEYPOT_FIELD]?.trim()) return { ok: false, reason: "honeypot" };
  return checkFormToken(input.renderedAt, now, secret);
}
