// Screenshots of pages at phone and desktop sizes, signed in as a demo role, for design review.
// Usage: tsx scripts/shoot.ts <role|anon> <path> [path…]   (BASE_URL defaults to the demo app)
import { mkdirSync } from "node:fs";
import { DEMO_PASSWORD, DEMO_USERS } from "./seed/demo-people";
import { launchChromium } from "./chromium";

const [role, ...paths] = process.argv.slice(2);
const base = process.env.BASE_URL ?? "http://127.0.0.1:3000";
const out = process.env.SHOT_DIR ?? "/tmp/shots";
mkdirSync(out, { recursive: true });

const browser = await launchChromium();
for (const [label, viewport] of [
  ["phone", { width: 390, height: 844 }],
  ["desk", { width: 1366, height: 900 }],
] as const) {
  const ctx = await browser.newContext({ viewport, colorScheme: (process.env.SCHEME as "dark" | "light") ?? "light" });
  const page = await ctx.newPage();
  if (role !== "anon") {
    const u = DEMO_USERS.find((x) => x.role === role)!;
    await page.goto(`${base}/sign-in`);
    await page.fill("#email", u.email);
    await page.fill("#password", DEMO_PASSWORD);
    await Promise.all([page.waitForURL((url) => !url.pathname.startsWith("/sign-in")), page.click("button[type=submit]")]);
  }
  for (const p of paths) {
    await page.goto(`${base}${p}`, { waitUntil: (process.env.WAIT_UNTIL as "load") ?? "load" });
    await page.waitForTimeout(Number(process.env.SHOT_WAIT ?? 300));
    const file = `${out}/${role}${p.replace(/[/?=&]/g, "_") || "_root"}-${label}.png`;
    await page.screenshot({ path: file, fullPage: process.env.FULL === "1" });
    console.log(file);
  }
  await ctx.close();
}
await browser.close();
