// First-load JavaScript per page, compressed as it crosses the wire: the scripts the page's HTML
// asks for, loaded in headless Chromium from the running production server, signed in as a manager.
// Scripts fetched later (charts behind next/dynamic) are shown beside it, not counted in first load.
// A page over its target fails the run (exit code 1) and is named at the end.
import { launchChromium } from "../../chromium";
import { Client } from "pg";
import { record } from "../support/figures";
import { APP_URL, signedInCookie } from "./session";

const ROUTE_KB = 200;
const FORM_KB = 150;

const pg = new Client({ connectionString: process.env.DATABASE_URL });
await pg.connect();
const number = (await pg.query<{ number: string }>("select number from cases where status = 'signed' order by number limit 1")).rows[0]
  .number;
await pg.end();

type Role = Parameters<typeof signedInCookie>[0];
const pages: { path: string; target: number; signedIn: boolean; role?: Role }[] = [
  { path: "/sign-in", target: ROUTE_KB, signedIn: false },
  { path: "/forgot-password", target: ROUTE_KB, signedIn: false },
  { path: "/", target: ROUTE_KB, signedIn: true },
  { path: "/cases", target: ROUTE_KB, signedIn: true },
  { path: "/cases/new", target: FORM_KB, signedIn: true, role: "inspector" },
  { path: `/cases/${number}`, target: ROUTE_KB, signedIn: true },
  { path: `/cases/${number}/photos`, target: ROUTE_KB, signedIn: true },
  { path: `/cases/${number}/report`, target: ROUTE_KB, signedIn: true },
  { path: "/photos/compare", target: ROUTE_KB, signedIn: true },
  { path: "/search", target: ROUTE_KB, signedIn: true },
  { path: "/search?q=bearing", target: ROUTE_KB, signedIn: true },
  { path: "/tallies", target: ROUTE_KB, signedIn: true },
  { path: "/tallies/life", target: ROUTE_KB, signedIn: true },
  { path: "/tallies/yield", target: ROUTE_KB, signedIn: true },
  { path: "/reference", target: ROUTE_KB, signedIn: true },
  { path: "/profile", target: ROUTE_KB, signedIn: true },
  { path: "/admin/users", target: ROUTE_KB, signedIn: true, role: "admin" },
  { path: "/admin/sites", target: ROUTE_KB, signedIn: true, role: "admin" },
  { path: "/admin/codes", target: ROUTE_KB, signedIn: true, role: "admin" },
  { path: "/admin/outbox", target: ROUTE_KB, signedIn: true, role: "admin" },
  { path: "/admin/audit", target: ROUTE_KB, signedIn: true, role: "admin" },
];

const over: string[] = [];
const browser = await launchChromium();
try {
  const cookies = new Map<Role, string>();
  const cookieFor = async (role: Role) => cookies.get(role) ?? cookies.set(role, await signedInCookie(role)).get(role)!;
  const host = new URL(APP_URL).hostname;
  for (const p of pages) {
    const ctx = await browser.newContext({ baseURL: APP_URL });
    if (p.signedIn) {
      const cookie = await cookieFor(p.role ?? "manager");
      await ctx.addCookies(
        cookie.split("; ").map((pair) => {
          const at = pair.indexOf("=");
          return { name: pair.slice(0, at), value: pair.slice(at + 1), domain: host, path: "/" };
        }),
      );
    }
    const page = await ctx.newPage();
    const sizes = new Map<string, Promise<number>>();
    page.on("requestfinished", (req) => {
      if (req.resourceType() === "script")
        sizes.set(
          req.url(),
          req.sizes().then((s) => s.responseBodySize),
        );
    });
    const res = await page.goto(p.path, { waitUntil: "networkidle" });
    if (!res || res.status() !== 200) throw new Error(`${p.path} answered ${res?.status()}`);
    if (new URL(page.url()).pathname !== new URL(p.path, APP_URL).pathname) throw new Error(`${p.path} was sent on to ${page.url()}`);
    // What the served HTML itself asks for (script tags and script preloads), not what the page adds later.
    const html = await res.text();
    const refs = [...html.matchAll(/<(?:script[^>]*\ssrc|link[^>]*as="script"[^>]*\shref|link[^>]*\shref)="([^"]+\.js[^"]*)"/g)].map(
      (m) => new URL(m[1].replace(/&amp;/g, "&"), APP_URL).href,
    );
    const inHtml = new Set(refs);
    let first = 0,
      later = 0;
    for (const [url, size] of sizes) {
      if (inHtml.has(url)) first += await size;
      else later += await size;
    }
    const kb = first / 1024;
    const label = p.path.replace(number, "[number]");
    const fig = record({
      name: `first-load JS ${label}`,
      runs: 1,
      p50: kb,
      p95: kb,
      unit: "kB",
      target: p.target,
      note: `${(later / 1024).toFixed(1)} kB more fetched after load`,
    });
    if (!fig.ok) over.push(`${label} ${kb.toFixed(1)} kB > ${p.target} kB`);
    await ctx.close();
  }
} finally {
  await browser.close();
}
if (over.length) {
  console.error(`First-load JS over its target: ${over.join("; ")}`);
  process.exitCode = 1;
}
