import { fileURLToPath } from "node:url";
import { PHASE_DEVELOPMENT_SERVER } from "next/constants.js";
import { headerRules, servesHttps } from "./lib/security/security-headers.mjs";

/** @type {(phase: string) => import('next').NextConfig} */
const nextConfig = (phase) => ({
  reactStrictMode: true,
  poweredByHeader: false,
  // PGlite ships WASM and data files that must be loaded from node_modules at run time.
  serverExternalPackages: ["@electric-sql/pglite"],
  // Rendered pages, share images and cached reads live in memory only, within this many bytes
  // (least recently used first out), and the cache starts empty at each start: see the handler.
  cacheHandler: fileURLToPath(new URL("./lib/cache/bounded-cache-handler.mjs", import.meta.url)),
  cacheMaxMemorySize: 48 * 1024 * 1024,
  // Security headers on every response; the Counter and the account get a nonce policy from proxy.ts.
  async headers() {
    return headerRules({ development: phase === PHASE_DEVELOPMENT_SERVER, https: servesHttps(process.env.BETTER_AUTH_URL) });
  },
});

export default nextConfig;
