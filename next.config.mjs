import { PHASE_DEVELOPMENT_SERVER } from "next/constants.js";
import { headerRules, servesHttps } from "./lib/security/security-headers.mjs";

/** @type {(phase: string) => import('next').NextConfig} */
const nextConfig = (phase) => ({
  reactStrictMode: true,
  poweredByHeader: false,
  // PGlite ships WASM and data files that must be loaded from node_modules at run time.
  serverExternalPackages: ["@electric-sql/pglite"],
  // Security headers on every response; the Counter and the account get a nonce policy from proxy.ts.
  async headers() {
    return headerRules({ development: phase === PHASE_DEVELOPMENT_SERVER, https: servesHttps(process.env.BETTER_AUTH_URL) });
  },
});

export default nextConfig;
