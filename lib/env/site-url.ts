import { readEnv } from "./env";

/** The public address of the app, for absolute links in metadata, the sitemap and e-mails. */
export function siteUrl(): URL {
  const env = readEnv();
  return new URL(env.SITE_URL ?? env.BETTER_AUTH_URL);
}
