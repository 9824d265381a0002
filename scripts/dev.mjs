// `npm run dev`: the fake e-mail service, then `next dev` sending its e-mail there.
// Extra arguments go to next (`npm run dev -- -p 4000`). Set RESEND_BASE_URL yourself to skip the fake.
import { spawn } from "node:child_process";
import { DEFAULT_FAKE_RESEND_PORT, startFakeResend } from "./fake-resend.mjs";

/** A fake already answering on that port (another `npm run dev`, or one started alone) is reused. */
async function isFakeAt(url) {
  try {
    const response = await fetch(`${url}/emails`, { signal: AbortSignal.timeout(1000) });
    return (await response.json())?.object === "list";
  } catch {
    return false;
  }
}

async function startOrReuseFake() {
  const port = Number(process.env.FAKE_RESEND_PORT || DEFAULT_FAKE_RESEND_PORT);
  try {
    return await startFakeResend({ port });
  } catch (error) {
    if (error?.code !== "EADDRINUSE") throw error;
    const url = `http://127.0.0.1:${port}`;
    if (await isFakeAt(url)) return { url, close: async () => undefined };
    const fake = await startFakeResend({ port: 0 });
    console.warn(`Port ${port} is in use by something else; the fake e-mail service runs on port ${fake.port} instead.`);
    return fake;
  }
}

const env = { ...process.env };
let fake = null;
if (env.RESEND_BASE_URL) {
  console.log(`E-mail goes to ${env.RESEND_BASE_URL} (RESEND_BASE_URL is set, so no fake is started).`);
} else {
  fake = await startOrReuseFake();
  env.RESEND_BASE_URL = fake.url;
  console.log(`Fake e-mail service: nothing leaves this machine. Read what was sent: GET ${fake.url}/emails`);
}

const next = spawn(process.execPath, ["node_modules/next/dist/bin/next", "dev", ...process.argv.slice(2)], { env, stdio: "inherit" });

for (const signal of ["SIGINT", "SIGTERM"]) {
  process.on(signal, () => next.kill(signal));
}

next.on("exit", async (code, signal) => {
  await fake?.close();
  const signalNumbers = { SIGINT: 2, SIGTERM: 15 };
  process.exit(code ?? 128 + (signalNumbers[signal] ?? 1));
});
