import { eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { quoteReply, quoteRequest, type QuoteStatus } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import type { SessionUser } from "@/lib/auth/session";
import { sendRecordedEmail } from "@/lib/email/recorded-send";
import { getShopContact } from "@/lib/shop/queries";
import { quoteReplyEmail } from "./quote-emails";

/** Marks a request answered, closed or new again; false when there is no such request. */
export async function changeQuoteStatus(db: Database, id: number, status: QuoteStatus): Promise<boolean> {
  const changed = await db.update(quoteRequest).set({ status, updatedAt: new Date() }).where(eq(quoteRequest.id, id)).returning({ id: quoteRequest.id });
  return changed.length > 0;
}

export type ReplyOutcome =
  | { status: "not_found" }
  | { status: "sent"; replyId: number; emailSendId: number }
  | { status: "email_failed"; replyId: number; emailSendId: number; message: string };

/**
 * Keeps a staff reply and marks the request answered in one transaction, then e-mails the reply to
 * the driver and links the reply to its outbox entry. A failed e-mail leaves the reply kept, with
 * its failure shown beside it.
 */
export async function replyToQuoteRequest(db: Database, author: SessionUser, id: number, body: string): Promise<ReplyOutcome> {
  const saved = await db.transaction(async (tx) => {
    const [request] = await tx
      .update(quoteRequest)
      .set({ status: "answered", updatedAt: new Date() })
      .where(eq(quoteRequest.id, id))
      .returning({
        id: quoteRequest.id,
        name: quoteRequest.name,
        email: quoteRequest.email,
        phone: quoteRequest.phone,
        vehicle: quoteRequest.vehicle,
        tires: quoteRequest.tires,
        quantity: quoteRequest.quantity,
        preferredDay: quoteRequest.preferredDay,
      });
    if (!request) return null;
    const [reply] = await tx
      .insert(quoteReply)
      .values({ requestId: id, authorId: author.id, authorName: author.name || author.email, body })
      .returning({ id: quoteReply.id, authorName: quoteReply.authorName });
    if (!reply) throw new Error("the reply was not stored");
    await recordAudit(tx, author, [{ action: "request_replied", subject: `#${id}`, summary: `Request #${id} answered to ${request.email}` }]);
    return { request, reply };
  });
  if (!saved) return { status: "not_found" };

  const { request, reply } = saved;
  const shop = await getShopContact(db);
  const sent = await sendRecordedEmail(db, {
    senderId: author.id,
    kind: "quote_reply",
    reference: String(request.id),
    to: request.email,
    replyTo: shop?.email,
    message: quoteReplyEmail(request, { body, authorName: reply.authorName }, shop),
    idempotencyKey: `quote-reply-${reply.id}`,
  });
  await db.update(quoteReply).set({ emailSendId: sent.id }).where(eq(quoteReply.id, reply.id));
  return sent.ok
    ? { status: "sent", replyId: reply.id, emailSendId: sent.id }
    : { status: "email_failed", replyId: reply.id, emailSendId: sent.id, message: sent.message };
}
