"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { withAction } from "@/lib/auth/action";
import { multiLineText } from "@/lib/validation/text";
import { requestIdSchema } from "./queries";
import { storeQuoteRequest } from "./create-request";
import { MAX_REPLY_LENGTH, walkInRequestSchema } from "./quote-input";
import { changeQuoteStatus, replyToQuoteRequest } from "./staff-changes";
import { formatCount } from "@/lib/format/format";

const statusChangeSchema = z.object({
  id: requestIdSchema,
  // "offered" is set by sending an offer, never by hand.
  status: z.enum(["new", "answered", "closed"], { error: "choose new, answered or closed" }),
});

const replySchema = z.object({
  id: requestIdSchema,
  body: multiLineText("Write the reply before sending it.")
    .trim()
    .min(1, "Write the reply before sending it.")
    .max(MAX_REPLY_LENGTH, `Keep the reply under ${formatCount(MAX_REPLY_LENGTH)} characters.`),
});

const statusWords = { new: "open again", answered: "answered", closed: "closed" } as const;

function refreshInbox(id: number) {
  revalidatePath("/counter/requests");
  revalidatePath(`/counter/requests/${id}`);
}

/** Counter: marks a request answered or closed, or opens it again. */
export const setQuoteStatus = withAction({ role: "staff", input: statusChangeSchema }, async ({ db, input }) => {
  if (!(await changeQuoteStatus(db, input.id, input.status))) return { ok: false, status: 404, message: "There is no such request." };
  refreshInbox(input.id);
  return { ok: true, data: undefined, message: `Request marked ${statusWords[input.status]}.` };
});

/** Counter: a reply kept with the request and e-mailed to the driver. */
export const sendQuoteReply = withAction({ role: "staff", input: replySchema }, async ({ db, user, input }) => {
  const outcome = await replyToQuoteRequest(db, user, input.id, input.body);
  if (outcome.status === "not_found") return { ok: false, status: 404, message: "There is no such request." };
  refreshInbox(input.id);
  return outcome.status === "sent"
    ? { ok: true, data: undefined, message: "Reply sent by e-mail and kept with the request." }
    : { ok: true, data: undefined, message: "Reply kept with the request, but the e-mail could not be sent. It is listed in the outbox; try again later or call the driver." };
});

/**
 * Counter: a customer at the counter, recorded from the finder as a request with the tires picked,
 * ready for an offer. Nobody is e-mailed: the shop is the one asking, and the customer gets the offer.
 */
export const recordWalkIn = withAction({ role: "staff", input: walkInRequestSchema }, async ({ db, input }) => {
  const { id } = await storeQuoteRequest(db, { ...input, source: "counter" });
  revalidatePath("/counter/requests");
  return { ok: true, data: { id }, message: `Request #${id} recorded for ${input.name}.` };
});
