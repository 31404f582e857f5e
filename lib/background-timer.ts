// A repeating job inside the server process: started once per process (the guard survives module
// reloads), never overlapping itself when a run is slow, and never keeping the process alive.
type Holder = Record<symbol, NodeJS.Timeout | undefined>;

export function startBackgroundTimer(name: string, intervalMs: number, run: () => Promise<unknown>): boolean {
  const key = Symbol.for(`tearline.${name}`);
  const holder = globalThis as unknown as Holder;
  if (holder[key]) return false;
  let busy = false;
  const timer = setInterval(() => {
    if (busy) return;
    busy = true;
    run()
      .catch((err: unknown) => console.error(`${name} failed:`, err instanceof Error ? err.message : err))
      .finally(() => {
        busy = false;
      });
  }, intervalMs);
  timer.unref?.();
  holder[key] = timer;
  return true;
}

export function stopBackgroundTimer(name: string): void {
  const key = Symbol.for(`tearline.${name}`);
  const holder = globalThis as unknown as Holder;
  if (holder[key]) clearInterval(holder[key]);
  delete holder[key];
}
