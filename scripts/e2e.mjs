// The end-to-end suite in two lanes at once after one production build: the phone and http projects
// in one Playwright process, desktop in another (phone and desktop take about as long; http is short). Each lane starts its own server on its own port,
// with its own embedded database and fake e-mail inbox, so neither sees what the other changes.
// Arguments (a spec, --project=…, -g …) run one ordinary Playwright process instead.
import { spawn, spawnSync } from "node:child_process";

const playwright = ["node_modules/@playwright/test/cli.js", "test"];
const extra = process.argv.slice(2);

if (extra.length > 0) {
  process.exit(spawnSync(process.execPath, [...playwright, ...extra], { stdio: "inherit" }).status ?? 1);
}

const built = spawnSync("npm", ["run", "build"], { stdio: "inherit" });
if (built.status !== 0) process.exit(built.status ?? 1);

const port = Number(process.env.E2E_PORT ?? 3210);
const mailPort = Number(process.env.E2E_FAKE_RESEND_PORT ?? 3226);
const lanes = [["phone", "http"], ["desktop"]];

const runs = lanes.map((projects, lane) => {
  const env = {
    ...process.env,
    E2E_BUILT: "1",
    E2E_PORT: String(port + lane),
    E2E_FAKE_RESEND_PORT: String(mailPort + lane),
    E2E_OUTPUT_DIR: `test-results/${projects.join("-")}`,
  };
  const child = spawn(process.execPath, [...playwright, ...projects.map((project) => `--project=${project}`)], { stdio: "inherit", env });
  return new Promise((resolve) => child.once("exit", (code) => resolve(code ?? 1)));
});
const codes = await Promise.all(runs);
process.exit(codes.find((code) => code !== 0) ?? 0);
