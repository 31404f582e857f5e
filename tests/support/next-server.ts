// Starting and stopping a `next start` of the suite's build, and waiting for things: shared by the
// extra app server (app-server.ts) and the fault tests' private stack (stack.ts).
import { spawn, type ChildProcess, type StdioOptions } from "node:child_process";
import path from "node:path";

export const PROJECT = path.resolve(import.meta.dirname, "../..");
export const bin = (name: string) => path.join(PROJECT, "node_modules/.bin", name);

export async function waitUntil(what: string, ok: () => Promise<boolean>, seconds = 60): Promise<void> {
  const until = Date.now() + seconds * 1000;
  while (Date.now() < until) {
    if (await ok().catch(() => false)) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${what} within ${seconds} s`);
}

/** `next start` on a loopback port, with the given environment. */
export function spawnNextStart(port: number, env: NodeJS.ProcessEnv, stdio: StdioOptions): ChildProcess {
  return spawn(bin("next"), ["start", "-H", "127.0.0.1", "-p", String(port)], { cwd: PROJECT, env, stdio });
}

/** Sends the signal and waits (up to 10 s) for the process to end. */
export async function killAndWait(p: ChildProcess | undefined, signal: NodeJS.Signals): Promise<void> {
  if (!p || p.exitCode !== null || p.signalCode !== null) return;
  const gone = new Promise((r) => p.once("exit", r));
  p.kill(signal);
  await Promise.race([gone, new Promise((r) => setTimeout(r, 10_000))]);
}
