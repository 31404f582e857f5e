// Another `next start` of the same build on one more loopback port, sharing the suite's database,
// bucket and mail fake: what a railway runs behind a load balancer. Stopped by the test that starts it.
import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { freePort } from "./free-port";

export type AppServer = { url: string; process: ChildProcess; stop: () => Promise<void> };

async function healthy(url: string, untilMs: number): Promise<void> {
  while (Date.now() < untilMs) {
    try {
      if ((await fetch(`${url}/api/health`)).ok) return;
    } catch {
      /* not listening yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the extra app server at ${url} did not become healthy`);
}

export async function startAppServer(extraEnv: Record<string, string> = {}): Promise<AppServer> {
  const port = await freePort();
  const root = path.resolve(import.meta.dirname, "../..");
  const child = spawn(path.join(root, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: root,
    env: { ...process.env, ...extraEnv },
    stdio: ["ignore", "ignore", "inherit"],
  });
  const url = `http://127.0.0.1:${port}`;
  const stop = async () => {
    if (child.exitCode !== null) return;
    const exited = new Promise((r) => child.once("exit", r));
    child.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
    if (child.exitCode === null) child.kill("SIGKILL");
  };
  try {
    await healthy(url, Date.now() + 60_000);
  } catch (err) {
    await stop();
    throw err;
  }
  return { url, process: child, stop };
}
