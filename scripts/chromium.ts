// Headless Debian Chromium as every script and test starts it: no sandbox (root in CI), and none of
// the background connections this machine's closed network refuses.
import { chromium, type Browser } from "playwright-core";

export const CHROMIUM_FLAGS = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--disable-dev-shm-usage",
];

export function launchChromium(executablePath = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium"): Promise<Browser> {
  return chromium.launch({ executablePath, args: CHROMIUM_FLAGS });
}
