import { spawn, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { createServer } from "node:net";
import path from "node:path";

export interface RunningServer {
  url: string;
  /** SIGTERM, and wait for the process to end. */
  stop: () => Promise<void>;
  /** SIGKILL (`kill -9`): the process ends mid-write, with no chance to flush or close anything. */
  kill: () => Promise<void>;
}

export const hasProductionBuild = () => existsSync(path.join(process.cwd(), ".next", "BUILD_ID"));

/** Builds the app when there is no production build yet. */
export function ensureProductionBuild(): void {
  if (hasProductionBuild()) return;
  const build = spawnSync("npm", ["run", "build"], { stdio: "inherit" });
  if (build.status !== 0) process.exit(build.status ?? 1);
}

/** A port nothing listens on now, for a server of the bench's own. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once("error", reject);
    probe.listen(0, "127.0.0.1", () => {
      const address = probe.address();
      probe.close(() => (typeof address === "object" && address ? resolve(address.port) : reject(new Error("no port"))));
    });
  });
}

/** Waits until `url` answers 2xx. */
export async function waitForAnswer(url: string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`${url} did not answer in ${timeoutMs / 1000} s`);
}

/**
 * `next start` on the existing production build, on a free port, over the embedded database in
 * `dataDir`; its process is the server itself, so stopping it leaves nothing behind. `env` adds
 * settings (limits raised for a load test, say).
 */
export async function startProductionServer(dataDir: string, env: Record<string, string> = {}): Promise<RunningServer> {
  const port = await freePort();
  const url = `http://localhost:${port}`;
  const server = spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-p", String(port)], {
    env: { ...process.env, PGLITE_DATA_DIR: dataDir, DATABASE_URL: "", DEMO_SEED: "on", BETTER_AUTH_URL: url, NEXT_TELEMETRY_DISABLED: "1", ...env },
    stdio: "ignore",
  });
  const exited = new Promise<void>((resolve) => server.once("exit", () => resolve()));
  const stop = async () => {
    server.kill("SIGTERM");
    await exited;
  };
  const kill = async () => {
    server.kill("SIGKILL");
    await exited;
  };
  try {
    // A first start migrates and seeds a fresh database, which takes a while on a busy machine.
    await waitForAnswer(`${url}/api/health`, 120_000);
  } catch (error) {
    await stop();
    throw error;
  }
  return { url, stop, kill };
}
