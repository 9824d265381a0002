import { availableParallelism } from "node:os";
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
    // Every file opens its own database, so files run side by side on every core (the default leaves one idle).
    maxWorkers: availableParallelism(),
    // Worker threads rather than child processes: each file still gets its own module graph and copy of
    // process.env, and the whole run took 230 s instead of 297 s on a 2-core machine, mostly in imports.
    pool: "threads",
    // A wait, not a measure: a file that migrates a fresh database from nothing takes a few seconds alone
    // and several times that on a busy 2-core machine; every test still ends as soon as it passes.
    testTimeout: 90_000,
    hookTimeout: 120_000,
  },
});
