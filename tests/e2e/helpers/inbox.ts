/** The fake e-mail service's inbox, which the app sends to during the end-to-end tests. */
const inboxUrl = `${process.env.E2E_FAKE_RESEND_URL ?? "http://127.0.0.1:3226"}/emails`;

export interface ReceivedEmail {
  to: string | string[];
  subject: string;
  text?: string;
  html?: string;
  attachments?: { filename: string; content: string; content_type?: string; contentType?: string }[];
}

/** Every e-mail the fake service holds for one address, newest first. */
export async function emailsTo(address: string): Promise<ReceivedEmail[]> {
  const { data } = (await (await fetch(inboxUrl)).json()) as { data: ReceivedEmail[] };
  return data.filter((email) => email.to === address || (Array.isArray(email.to) && email.to.includes(address)));
}
