import { fileURLToPath } from "node:url";
import react from "@vitejs/plugin-react";
import { defineConfig } from "vitest/config";

export default defineConfig({
  plugins: [react()],
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    environment: "node",
    include: ["tests/unit/**/*.test.{ts,tsx}", "tests/integration/**/*.test.{ts,tsx}", "tests/security/**/*.test.{ts,tsx}"],
    globalSetup: ["tests/integration/global-setup.ts"],
    reporters: process.env.CI ? ["verbose"] : ["default"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
