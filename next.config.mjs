import { PHASE_DEVELOPMENT_SERVER } from "next/constants.js";
import { API_POLICY, commonHeaders, pagePolicy, servesHttps } from "./lib/security/security-headers.mjs";

/** @type {(phase: string) => import('next').NextConfig} */
const nextConfig = (phase) => {
  const https = servesHttps(process.env.BETTER_AUTH_URL);
  const development = phase === PHASE_DEVELOPMENT_SERVER;
  return {
    reactStrictMode: true,
    poweredByHeader: false,
    // PGlite ships WASM and data files that must be loaded from node_modules at run time.
    serverExternalPackages: ["@electric-sql/pglite"],
    // Applied to static files and prerendered pages too, so no page turns dynamic for a header. The
    // Counter and the account get a nonce policy from proxy.ts instead.
    async headers() {
      return [
        { source: "/:path*", headers: commonHeaders({ https }) },
        {
          source: "/((?!api/|counter/|counter$|account/|account$).*)",
          headers: [{ key: "Content-Security-Policy", value: pagePolicy({ development, https }) }],
        },
        { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: API_POLICY }] },
      ];
    },
  };
};

export default nextConfig;
