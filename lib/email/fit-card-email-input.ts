import { z } from "zod";
import { multiLineText } from "@/lib/validation/text";

export const MAX_EMAIL_MESSAGE_LENGTH = 1000;

/** POST /api/v1/fit-cards/{slug}/email; the staff form checks the same rules in the browser. */
export const fitCardEmailBodySchema = z
  .object({
    to: z.email({ error: "Enter an e-mail address such as name@example.com." }).max(254, { error: "An e-mail address has at most 254 characters." }),
    message: multiLineText().trim().max(MAX_EMAIL_MESSAGE_LENGTH, { error: `Keep the message to ${MAX_EMAIL_MESSAGE_LENGTH} characters or fewer.` }).optional(),
  })
  .strict();

export type FitCardEmailBody = z.infer<typeof fitCardEmailBodySchema>;

/** What a client may send as Idempotency-Key: a UUID, or any short token of letters, digits and - _ . : */
export const idempotencyHeaderSchema = z.string().regex(/^[A-Za-z0-9._:-]{8,100}$/);

/** The 202 body: the attempt was recorded, whether or not the e-mail service took it. */
export const fitCardEmailAnswerSchema = z.discriminatedUnion("status", [
  z.object({ id: z.number().int(), status: z.literal("sent"), providerId: z.string() }),
  z.object({ id: z.number().int(), status: z.literal("failed"), message: z.string().describe("Why the e-mail service did not take it; send again with the same Idempotency-Key to retry.") }),
]);

export type FitCardEmailAnswer = z.infer<typeof fitCardEmailAnswerSchema>;
