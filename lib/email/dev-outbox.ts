import { z } from "zod";
import { readEmailEnv } from "./email-env";
import { redactSecretLinks, visibleLinks } from "./redact-links";

const receivedSchema = z.object({
  id: z.string(),
  created_at: z.string(),
  to: z.union([z.string(), z.array(z.string())]),
  subject: z.string(),
  text: z.string().optional(),
  attachments: z.array(z.object({ filename: z.string() })).optional(),
});
const inboxSchema = z.object({ data: z.array(z.unknown()) });

export interface OutboxEmail {
  id: string;
  receivedAt: Date;
  to: string;
  subject: string;
  text: string;
  links: string[];
  /** The attached files' names (a calendar entry's fitting.ics); their content is not shown. */
  attachments: string[];
}

export type DevOutbox = { status: "not_local" } | { status: "unreachable"; url: string; message: string } | { status: "ok"; url: string; emails: OutboxEmail[] };

/**
 * What the local fake e-mail service has received, read on the server. Only when e-mail goes to a
 * service on this machine: a real provider's mail is never listed here. Links that would let a
 * reader in (password resets and the like) are hidden: the Outbox shows staff what customers were
 * sent, never a way into someone else's account.
 */
export async function readDevOutbox(): Promise<DevOutbox> {
  const env = readEmailEnv();
  if (!env.ok || !env.baseUrl || !["127.0.0.1", "localhost", "[::1]"].includes(new URL(env.baseUrl).hostname)) return { status: "not_local" };
  const url = env.baseUrl;
  try {
    const response = await fetch(`${url}/emails`, { cache: "no-store", signal: AbortSignal.timeout(3000) });
    const inbox = inboxSchema.parse(await response.json());
    const emails = inbox.data.flatMap((item) => {
      const parsed = receivedSchema.safeParse(item);
      if (!parsed.success) return [];
      const { id, created_at, to, subject, text = "", attachments = [] } = parsed.data;
      return [
        {
          id,
          receivedAt: new Date(created_at),
          to: Array.isArray(to) ? to.join(", ") : to,
          subject,
          text: redactSecretLinks(text),
          links: visibleLinks(text),
          attachments: attachments.map((attachment) => attachment.filename),
        },
      ];
    });
    return { status: "ok", url, emails };
  } catch (error) {
    return { status: "unreachable", url, message: error instanceof Error ? error.message : String(error) };
  }
}
