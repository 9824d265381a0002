import { readEnv } from "@/lib/env/env";

const DEVELOPMENT_KEY = "re_development_fake";

export type EmailEnv = { ok: true; baseUrl?: string; apiKey: string; from: string } | { ok: false; message: string };

function isLoopback(address: string): boolean {
  return ["127.0.0.1", "localhost", "[::1]"].includes(new URL(address).hostname);
}

/**
 * Where e-mail goes and as whom. A service on this machine (the local fake) needs no real key;
 * anywhere else, RESEND_API_KEY is required: without it this answers a message instead of throwing,
 * so that a missing key never breaks the page that wanted to send.
 */
export function readEmailEnv(source: NodeJS.ProcessEnv = process.env): EmailEnv {
  const { RESEND_BASE_URL: baseUrl, RESEND_API_KEY: key, EMAIL_FROM: from } = readEnv(source);
  const apiKey = key ?? (baseUrl && isLoopback(baseUrl) ? DEVELOPMENT_KEY : undefined);
  if (!apiKey) {
    return {
      ok: false,
      message: "E-mail is not set up: set RESEND_API_KEY, or point RESEND_BASE_URL at the local fake (npm run dev starts one).",
    };
  }
  return { ok: true, baseUrl: baseUrl?.replace(/\/+$/, ""), apiKey, from };
}
