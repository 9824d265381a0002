import { z } from "zod";

const siteUrlSchema = z.url({ protocol: /^https?$/ });

/** The public address of the app, for absolute links in metadata, the sitemap and e-mails. */
export function siteUrl(): URL {
  const raw = process.env.SITE_URL || process.env.BETTER_AUTH_URL || "http://localhost:3000";
  const parsed = siteUrlSchema.safeParse(raw);
  if (!parsed.success) throw new Error(`SITE_URL must be an http(s) address, got "${raw}"`);
  return new URL(parsed.data);
}
