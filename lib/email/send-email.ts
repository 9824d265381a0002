import { Resend } from "resend";
import { z } from "zod";
import { readEmailEnv } from "./email-env";
import type { EmailMessage } from "./email-message";
import { renderEmail } from "./render-email";

/** The most attachments one e-mail carries, and the most bytes each: calendar files and the like, never bulk. */
export const ATTACHMENT_LIMITS = { count: 3, bytes: 64 * 1024 } as const;

const contentBytes = (content: string | Uint8Array): number => (typeof content === "string" ? Buffer.byteLength(content, "base64") : content.byteLength);

const attachmentSchema = z.object({
  // A name every mail program shows and saves as it is: letters, digits, dot, dash and underscore, starting with a letter or digit.
  filename: z.string().regex(/^[A-Za-z0-9][A-Za-z0-9._-]{0,99}$/, "a file name is 1–100 letters, digits, dots, dashes or underscores, starting with a letter or digit"),
  content: z
    .union([z.instanceof(Uint8Array), z.base64("attachment content is base64 text or bytes")])
    .refine((content) => contentBytes(content) >= 1 && contentBytes(content) <= ATTACHMENT_LIMITS.bytes, `an attachment holds 1 to ${ATTACHMENT_LIMITS.bytes} bytes`),
  contentType: z
    .string()
    .regex(/^[a-z]+\/[a-z0-9.+-]+(; ?[a-z-]+=[A-Za-z0-9._-]+)*$/, "a content type is type/subtype with optional parameters, e.g. text/calendar; charset=utf-8"),
});

export type EmailAttachment = z.input<typeof attachmentSchema>;

const emailSchema = z.object({
  to: z.union([z.email(), z.array(z.email()).min(1).max(50)]),
  // The one path to the provider refuses what would break a header; renderEmail has already made it one line.
  subject: z.string().trim().min(1).max(300).regex(/^[^\u0000-\u001f\u007f]*$/, "a header holds no line break or control character"),
  text: z.string().min(1),
  html: z.string().min(1).optional(),
  replyTo: z.email().optional(),
  attachments: z.array(attachmentSchema).min(1).max(ATTACHMENT_LIMITS.count).optional(),
});

export type OutgoingEmail = z.input<typeof emailSchema>;
export type SendEmailResult = { ok: true; id: string } | { ok: false; message: string };

function failed(message: string): SendEmailResult {
  console.error(`E-mail not sent: ${message}`);
  return { ok: false, message };
}

export interface SendOptions {
  /** Sent as the provider's Idempotency-Key: a retry with the same key never delivers twice. */
  idempotencyKey?: string;
}

/** The one way the product sends e-mail. Never throws: a failure is logged and answered as a message. */
export async function sendEmail(email: OutgoingEmail, { idempotencyKey }: SendOptions = {}): Promise<SendEmailResult> {
  const parsed = emailSchema.safeParse(email);
  if (!parsed.success) return failed(`invalid e-mail: ${parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}`);
  const env = readEmailEnv();
  if (!env.ok) return failed(env.message);
  try {
    // Created per send: the SDK throws at construction when there is no key.
    const resend = new Resend(env.apiKey, env.baseUrl ? { baseUrl: env.baseUrl } : undefined);
    const { data, error } = await resend.emails.send({ from: env.from, ...parsed.data }, idempotencyKey ? { idempotencyKey } : undefined);
    if (error) return failed(`${error.name}: ${error.message}`);
    return { ok: true, id: data.id };
  } catch (error) {
    return failed(error instanceof Error ? error.message : String(error));
  }
}

/** Renders an e-mail's blocks and sends it, for e-mails no one keeps a record of (the sign-in service's). Never throws. */
export async function sendMessage(to: string, message: EmailMessage): Promise<SendEmailResult> {
  try {
    return await sendEmail({ to, ...(await renderEmail(message)) });
  } catch (error) {
    return failed(error instanceof Error ? error.message : String(error));
  }
}
