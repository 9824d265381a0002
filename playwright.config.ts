import { existsSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { defineConfig, devices } from "@playwright/test";

const port = Number(process.env.E2E_PORT ?? 3210);
const baseURL = `http://localhost:${port}`;
// The app's e-mail goes to a fake of the e-mail service; tests read its inbox at GET <url>/emails.
const fakeResendUrl = `http://127.0.0.1:${Number(process.env.E2E_FAKE_RESEND_PORT ?? 3226)}`;
process.env.E2E_FAKE_RESEND_URL = fakeResendUrl;

function findChromium(): string {
  const candidates = [process.env.CHROMIUM_PATH, "/usr/bin/chromium", "/usr/bin/chromium-browser"].filter(
    (candidate): candidate is string => Boolean(candidate),
  );
  const found = candidates.find((candidate) => existsSync(candidate));
  if (!found) {
    throw new Error(
      "No Chromium found for the end-to-end tests. Install Debian's browser with `sudo apt-get install -y chromium`, " +
        "or point CHROMIUM_PATH at a Chromium binary.",
    );
  }
  return found;
}

// Every run gets its own embedded database, so the e2e tests never touch development data.
const e2eDataDir = process.env.E2E_PGLITE_DATA_DIR ?? path.join(mkdtempSync(path.join(tmpdir(), "sidewise-e2e-")), "pglite");
process.env.E2E_PGLITE_DATA_DIR = e2eDataDir;

export default defineConfig({
  testDir: "tests",
  fullyParallel: false,
  workers: 1,
  forbidOnly: Boolean(process.env.CI),
  retries: process.env.CI ? 1 : 0,
  reporter: process.env.CI ? [["list"]] : [["list"]],
  // Each of scripts/e2e.mjs's lanes keeps its traces and screenshots apart: Playwright empties its
  // output folder when it starts, and both lanes' first workers would share one artifacts folder.
  outputDir: process.env.E2E_OUTPUT_DIR ?? "test-results",
  // Waits, not measures: with two suites at once on two cores (load average near 20) the Counter's
  // page after a sign-in and the finder's first results each took over 10 s to show, and a flow
  // takes two to three times its usual length. Each test and expect still ends as soon as it holds.
  timeout: 90_000,
  expect: { timeout: 30_000 },
  use: {
    baseURL,
    trace: "retain-on-failure",
    launchOptions: {
      executablePath: findChromium(),
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
        "--no-first-run",
        "--disable-quic",
      ],
    },
  },
  projects: [
    { name: "phone", testMatch: "e2e/**/*.spec.ts", use: { ...devices["Pixel 7"], viewport: { width: 360, height: 780 }, defaultBrowserType: "chromium" } },
    { name: "desktop", testMatch: "e2e/**/*.spec.ts", use: { ...devices["Desktop Chrome"], viewport: { width: 1280, height: 900 } } },
    // Requests from outside, over HTTP only: the security checks against the production build.
    { name: "http", testMatch: "security/**/*.spec.ts" },
  ],
  webServer: [
    {
      command: "node scripts/fake-resend.mjs",
      url: `${fakeResendUrl}/emails`,
      reuseExistingServer: !process.env.CI,
      env: { FAKE_RESEND_PORT: new URL(fakeResendUrl).port },
    },
    {
      // scripts/e2e.mjs builds once for both of its lanes and says so with E2E_BUILT.
      command: `${process.env.E2E_BUILT ? "" : "npm run build && "}node node_modules/next/dist/bin/next start -p ${port}`,
      url: `${baseURL}/api/health`,
      timeout: 300_000,
      reuseExistingServer: !process.env.CI,
      stdout: "pipe",
      env: {
        PGLITE_DATA_DIR: e2eDataDir,
        DATABASE_URL: "",
        DEMO_SEED: "on",
        BETTER_AUTH_URL: baseURL,
        NEXT_TELEMETRY_DISABLED: "1",
        RESEND_BASE_URL: fakeResendUrl,
        RESEND_API_KEY: "",
        EMAIL_FROM: "",
        // Tests release holds and send reminders themselves when they need to; no step runs on a timer behind them.
        FITTING_SCHEDULE: "off",
      },
    },
  ],
});
