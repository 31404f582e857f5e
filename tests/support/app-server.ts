// Another `next start` of the same build on one more loopback port, sharing the suite's database,
// bucket and mail fake: what a railway runs behind a load balancer. Stopped by the test that starts it.
import type { ChildProcess } from "node:child_process";
import { freePort } from "./free-port";
import { killAndWait, spawnNextStart, waitUntil } from "./next-server";

export type AppServer = { url: string; process: ChildProcess; stop: () => Promise<void> };

export async function startAppServer(extraEnv: Record<string, string> = {}): Promise<AppServer> {
  const port = await freePort();
  const child = spawnNextStart(port, { ...process.env, ...extraEnv }, ["ignore", "ignore", "inherit"]);
  const url = `http://127.0.0.1:${port}`;
  const stop = async () => {
    await killAndWait(child, "SIGTERM");
    await killAndWait(child, "SIGKILL");
  };
  try {
    await waitUntil(`the extra app server at ${url} became healthy`, async () => (await fetch(`${url}/api/health`)).ok, 60);
  } catch (err) {
    await stop();
    throw err;
  }
  return { url, process: child, stop };
}
