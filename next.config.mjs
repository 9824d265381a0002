/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // PGlite ships WASM and data files that must be loaded from node_modules at run time.
  serverExternalPackages: ["@electric-sql/pglite"],
};

export default nextConfig;
