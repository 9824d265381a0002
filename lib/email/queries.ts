import { and, desc, eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { emailSend, user } from "@/db/schema";

const sendColumns = {
  id: emailSend.id,
  createdAt: emailSend.createdAt,
  updatedAt: emailSend.updatedAt,
  kind: emailSend.kind,
  reference: emailSend.reference,
  senderName: user.name,
  toAddress: emailSend.toAddress,
  subject: emailSend.subject,
  status: emailSend.status,
  attempts: emailSend.attempts,
  error: emailSend.error,
};

/** For staff only: who e-mailed a Fit card to whom, when, and how it went, newest first. */
export function listFitCardSends(db: Database, slug: string) {
  return db
    .select(sendColumns)
    .from(emailSend)
    .leftJoin(user, eq(emailSend.senderId, user.id))
    .where(and(eq(emailSend.kind, "fit_card"), eq(emailSend.reference, slug)))
    .orderBy(desc(emailSend.createdAt), desc(emailSend.id))
    .limit(100);
}

/** For staff only: the most recent e-mails the product sent or tried to send, of every kind. */
export function listRecentSends(db: Database, limit = 50) {
  return db.select(sendColumns).from(emailSend).leftJoin(user, eq(emailSend.senderId, user.id)).orderBy(desc(emailSend.createdAt), desc(emailSend.id)).limit(limit);
}

export type EmailSendRow = Awaited<ReturnType<typeof listRecentSends>>[number];
