export const DEFAULT_FAKE_RESEND_PORT: number;

/** One e-mail as the fake received it: the SDK's request body, plus the id it answered and when. */
export interface ReceivedEmail {
  id: string;
  created_at: string;
  from: string;
  to: string | string[];
  subject: string;
  text?: string;
  html?: string;
  reply_to?: string | string[];
  /** As the SDK sends them: content in base64. */
  attachments?: { filename: string; content?: string; path?: string; content_type?: string }[];
  [field: string]: unknown;
}

export interface FakeResend {
  url: string;
  port: number;
  /** Newest first. */
  received: () => ReceivedEmail[];
  close: () => Promise<void>;
}

export function startFakeResend(options?: {
  port?: number;
  host?: string;
  /** Sends answer this error; only the first `times` of them when it is given. */
  failWith?: { statusCode: number; name: string; message: string; times?: number };
}): Promise<FakeResend>;
