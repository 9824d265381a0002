/**
 * The floor the page benches measure against: a bare Next.js app (one page of text, no package of
 * ours) built with this project's own next and react, production build, served by `next start`.
 * Built in a temporary folder whose node_modules is a link to ours, so the versions always match.
 */
import { spawn, spawnSync } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { freePort, type RunningServer, waitForAnswer } from "./production-server";

export interface BareNextApp {
  /** The bare app's one page. */
  page: string;
  server: RunningServer;
}

const files: Record<string, string> = {
  "package.json": JSON.stringify({ name: "bare-next-page", private: true, type: "module" }),
  "next.config.mjs": "export default { poweredByHeader: false, turbopack: { root: '/' } };\n",
  "app/layout.jsx": [
    "export const metadata = { title: 'Bare page', description: 'A bare Next.js page, the floor of the page benches.' };",
    "export default function RootLayout({ children }) {",
    "  return <html lang=\"en\"><body>{children}</body></html>;",
    "}",
  ].join("\n"),
  "app/page.jsx": "export default function Page() {\n  return <main><h1>Bare page</h1><p>One paragraph of text.</p></main>;\n}\n",
};

/** Writes and builds the bare app. */
function buildBareApp(): string {
  const folder = mkdtempSync(path.join(tmpdir(), "sidewise-bare-next-"));
  for (const [name, text] of Object.entries(files)) {
    mkdirSync(path.dirname(path.join(folder, name)), { recursive: true });
    writeFileSync(path.join(folder, name), text);
  }
  symlinkSync(path.join(process.cwd(), "node_modules"), path.join(folder, "node_modules"), "dir");
  const build = spawnSync(process.execPath, ["node_modules/next/dist/bin/next", "build"], {
    cwd: folder,
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" },
    encoding: "utf8",
  });
  if (build.status !== 0) {
    rmSync(folder, { recursive: true, force: true });
    throw new Error(`the bare Next.js app did not build:\n${build.stdout}\n${build.stderr}`);
  }
  return folder;
}

let builtFolder: string | undefined;

/** The bare app, built once per process (`npm run bench` serves it to two benches); its folder goes when the process ends. */
function bareAppFolder(): string {
  if (builtFolder) return builtFolder;
  const folder = buildBareApp();
  process.once("exit", () => rmSync(folder, { recursive: true, force: true }));
  builtFolder = folder;
  return folder;
}

/** Serves the bare app (built on first use) on a free port. */
export async function startBareNextApp(): Promise<BareNextApp> {
  const folder = bareAppFolder();
  const port = await freePort();
  const url = `http://localhost:${port}`;
  const child = spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-p", String(port)], {
    cwd: folder,
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: "1" },
    stdio: "ignore",
  });
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const end = (signal: NodeJS.Signals) => async () => {
    child.kill(signal);
    await exited;
  };
  const server: RunningServer = { url, stop: end("SIGTERM"), kill: end("SIGKILL") };
  try {
    await waitForAnswer(`${url}/`, 60_000);
  } catch (error) {
    await server.stop();
    throw error;
  }
  return { page: "/", server };
}
