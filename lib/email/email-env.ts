import { z } from "zod";

const DEFAULT_FROM = "Marrowby Tire Works <counter@marrowby-tire.test>";
const DEVELOPMENT_KEY = "re_development_fake";

const emailEnvSchema = z.object({
  RESEND_BASE_URL: z.url({ protocol: /^https?$/, error: "RESEND_BASE_URL must be an http(s) address" }).optional(),
  RESEND_API_KEY: z.string().trim().min(1).optional(),
  EMAIL_FROM: z.string().trim().min(3).default(DEFAULT_FROM),
});

export type EmailEnv = { ok: true; baseUrl?: string; apiKey: string; from: string } | { ok: false; message: string };

function isLoopback(address: string): boolean {
  return ["127.0.0.1", "localhost", "[::1]"].includes(new URL(address).hostname);
}

/**
 * Where e-mail goes and as whom. A service on this machine (the local fake) needs no real key;
 * anywhere else, RESEND_API_KEY is required. Answers a message instead of throwing, so that a
 * missing setting never breaks the page that wanted to send.
 */
export function readEmailEnv(source: NodeJS.ProcessEnv = process.env): EmailEnv {
  const parsed = emailEnvSchema.safeParse({
    RESEND_BASE_URL: source.RESEND_BASE_URL || undefined,
    RESEND_API_KEY: source.RESEND_API_KEY || undefined,
    EMAIL_FROM: source.EMAIL_FROM || undefined,
  });
  if (!parsed.success) {
    return { ok: false, message: `Invalid environment: ${parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}` };
  }
  const { RESEND_BASE_URL: baseUrl, RESEND_API_KEY: key, EMAIL_FROM: from } = parsed.data;
  const apiKey = key ?? (baseUrl && isLoopback(baseUrl) ? DEVELOPMENT_KEY : undefined);
  if (!apiKey) {
    return {
      ok: false,
      message: "E-mail is not set up: set RESEND_API_KEY, or point RESEND_BASE_URL at the local fake (npm run dev starts one).",
    };
  }
  return { ok: true, baseUrl: baseUrl?.replace(/\/+$/, ""), apiKey, from };
}
