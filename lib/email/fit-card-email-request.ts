import { randomUUID } from "node:crypto";
import type { Database } from "@/db/client";
import { recordAudit, type Actor } from "@/lib/audit/record";
import { readEnv } from "@/lib/env/env";
import { readFitCard } from "@/lib/fit-cards/read-card";
import { hitRateLimit, type RateLimitVerdict } from "@/lib/rate-limit/rate-limit";
import { getShopContact } from "@/lib/shop/queries";
import { fitCardEmailContent } from "./fit-card-email-content";
import type { FitCardEmailBody } from "./fit-card-email-input";
import { fitCardEmail } from "./fit-card-email";
import { type RecordedSendResult, sendRecordedEmail } from "./recorded-send";

/** Fit card e-mails one staff member may send per hour (default 20; FIT_CARD_EMAIL_LIMIT_PER_HOUR changes it). */
export function fitCardEmailLimit() {
  return { limit: readEnv().FIT_CARD_EMAIL_LIMIT_PER_HOUR, windowSeconds: 60 * 60 };
}

function hitFitCardEmailLimit(db: Database, userId: string): Promise<RateLimitVerdict> {
  return hitRateLimit(db, `fit-card-email:${userId}`, fitCardEmailLimit());
}

export type EmailFitCardOutcome =
  | { status: "missing" }
  | { status: "withdrawn"; why: "revoked" | "expired" }
  | { status: "rate_limited"; retryAfterSeconds: number }
  | { status: "attempted"; result: RecordedSendResult };

export interface FitCardEmailRequest {
  /** The staff member sending it, who the audit log names. */
  sender: Actor;
  slug: string;
  link: string;
  body: FitCardEmailBody;
  /** The client's Idempotency-Key; null makes this request an e-mail of its own. */
  clientKey: string | null;
}

/**
 * E-mails a Fit card's link and key numbers. The same client key for the same card always means the
 * same e-mail, so a "Try again" after a failure or a timeout never delivers it twice.
 */
export async function emailFitCard(db: Database, { sender, slug, link, body, clientKey }: FitCardEmailRequest): Promise<EmailFitCardOutcome> {
  const lookup = await readFitCard(db, slug);
  if (lookup.status !== "found") return lookup;
  const verdict = await hitFitCardEmailLimit(db, sender.id);
  if (!verdict.allowed) return { status: "rate_limited", retryAfterSeconds: verdict.retryAfterSeconds };
  const content = fitCardEmailContent({ card: lookup.card, shop: await getShopContact(db), link, message: body.message });
  const result = await sendRecordedEmail(db, {
    senderId: sender.id,
    kind: "fit_card",
    reference: slug,
    to: body.to,
    message: fitCardEmail(content),
    idempotencyKey: `fit-card:${slug}:${clientKey ?? randomUUID()}`,
  });
  if (!(result.ok && result.alreadySent)) {
    const how = result.ok ? "" : ` (not delivered: ${result.message})`;
    await recordAudit(db, sender, [{ action: "fit_card_emailed", subject: slug, summary: `Fit card ${slug} e-mailed to ${body.to}${how}` }]);
  }
  return { status: "attempted", result };
}
