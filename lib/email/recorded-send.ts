import { and, eq, ne, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { emailSend, type EmailKind } from "@/db/schema";
import { headerText, type EmailMessage } from "./email-message";
import { renderEmail } from "./render-email";
import { type EmailAttachment, sendEmail } from "./send-email";

export interface RecordedEmail {
  /** The signed-in person sending it; null when the product sends on its own. */
  senderId: string | null;
  kind: EmailKind;
  /** What the e-mail is about: a Fit card's slug, a quote request's id. */
  reference: string;
  to: string;
  message: EmailMessage;
  /** Where a reply to the e-mail goes, when not to the sender. */
  replyTo?: string;
  /** Files sent with it, such as a calendar entry; not recorded, only sent. */
  attachments?: EmailAttachment[];
  /** Same key, same e-mail: a retry after a failure or a timeout never delivers it twice. */
  idempotencyKey: string;
}

export type RecordedSendResult =
  | { ok: true; id: number; providerId: string; alreadySent: boolean }
  | { ok: false; id: number; message: string };

async function findOrCreateRow(db: Database, email: RecordedEmail) {
  const [created] = await db
    .insert(emailSend)
    .values({
      senderId: email.senderId,
      kind: email.kind,
      reference: email.reference,
      toAddress: email.to,
      subject: headerText(email.message.subject),
      idempotencyKey: email.idempotencyKey,
    })
    .onConflictDoNothing({ target: emailSend.idempotencyKey })
    .returning({ id: emailSend.id, status: emailSend.status, providerId: emailSend.providerId });
  if (created) return created;
  const [existing] = await db
    .select({ id: emailSend.id, status: emailSend.status, providerId: emailSend.providerId })
    .from(emailSend)
    .where(eq(emailSend.idempotencyKey, email.idempotencyKey));
  if (!existing) throw new Error(`The e-mail record for key ${email.idempotencyKey} vanished while it was being sent.`);
  return existing;
}

/**
 * Sends an e-mail and records it in `email_send`, keyed by its idempotency key. A key already sent
 * answers the earlier send and sends nothing; a key that failed (or never finished) is tried again
 * with the same key, which the provider uses to deliver at most once.
 */
export async function sendRecordedEmail(db: Database, email: RecordedEmail): Promise<RecordedSendResult> {
  const row = await findOrCreateRow(db, email);
  if (row.status === "sent" && row.providerId) return { ok: true, id: row.id, providerId: row.providerId, alreadySent: true };

  const [claimed] = await db
    .update(emailSend)
    .set({ status: "sending", attempts: sql`${emailSend.attempts} + 1`, updatedAt: new Date() })
    .where(and(eq(emailSend.id, row.id), ne(emailSend.status, "sent")))
    .returning({ id: emailSend.id });
  if (!claimed) {
    // Another request finished the same e-mail between our read and this update.
    const [done] = await db.select({ providerId: emailSend.providerId }).from(emailSend).where(eq(emailSend.id, row.id));
    return { ok: true, id: row.id, providerId: done?.providerId ?? "", alreadySent: true };
  }

  const rendered = await renderEmail(email.message);
  const result = await sendEmail({ to: email.to, ...rendered, replyTo: email.replyTo, attachments: email.attachments }, { idempotencyKey: email.idempotencyKey });
  if (result.ok) {
    await db.update(emailSend).set({ status: "sent", providerId: result.id, error: null, updatedAt: new Date() }).where(eq(emailSend.id, row.id));
    return { ok: true, id: row.id, providerId: result.id, alreadySent: false };
  }
  await db.update(emailSend).set({ status: "failed", error: result.message, updatedAt: new Date() }).where(eq(emailSend.id, row.id));
  return { ok: false, id: row.id, message: result.message };
}
