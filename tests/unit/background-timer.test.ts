// The in-process job timer: one per name, and a slow run is never overlapped by the next tick.
import { afterEach, expect, test, vi } from "vitest";
import { startBackgroundTimer, stopBackgroundTimer } from "@/lib/background-timer";

afterEach(() => {
  stopBackgroundTimer("test job");
  vi.useRealTimers();
});

test("a second start with the same name does nothing", () => {
  vi.useFakeTimers();
  expect(startBackgroundTimer("test job", 1000, async () => undefined)).toBe(true);
  expect(startBackgroundTimer("test job", 1000, async () => undefined)).toBe(false);
});

test("ticks while a run is still busy are skipped, and a failure does not stop the timer", async () => {
  vi.useFakeTimers();
  let runs = 0;
  let release: () => void = () => undefined;
  startBackgroundTimer("test job", 1000, () => {
    runs++;
    if (runs === 1) return new Promise<void>((r) => (release = r));
    return Promise.reject(new Error("boom"));
  });
  const quiet = vi.spyOn(console, "error").mockImplementation(() => undefined);
  await vi.advanceTimersByTimeAsync(3500);
  expect(runs).toBe(1);
  release();
  await vi.advanceTimersByTimeAsync(2000);
  expect(runs).toBe(3);
  expect(quiet).toHaveBeenCalled();
  quiet.mockRestore();
});
