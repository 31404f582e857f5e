// Debian's Chromium driven by playwright-core (no browser download), for page tests. Test files
// use it through tests/support/browser-fixture.ts (browserPerFile) and the page objects in tests/support/pages/.
import type { Browser, BrowserContext } from "playwright-core";
import { launchChromium } from "../../scripts/chromium";
import { afterEach } from "vitest";
import { CHROMIUM_PATH } from "./env";

// Every page runs under the app's content-security policy; any violation fails the test that caused it.
const cspViolations: string[] = [];
const CSP_MESSAGE = /Content Security Policy|Content-Security-Policy|securitypolicyviolation/i;

afterEach(() => {
  const seen = cspViolations.splice(0);
  if (seen.length) throw new Error(`The page broke the content-security policy:\n${seen.join("\n")}`);
});

async function watchPolicy(ctx: BrowserContext) {
  ctx.on("console", (msg) => {
    if ((msg.type() === "error" || msg.type() === "warning") && CSP_MESSAGE.test(msg.text())) cspViolations.push(msg.text());
  });
  await ctx.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      console.error(
        `securitypolicyviolation: ${e.violatedDirective} blocked ${e.blockedURI || "inline"} (${e.sourceFile}:${e.lineNumber})`,
      );
    });
  });
}

export async function launch(): Promise<Browser> {
  const browser = await launchChromium(CHROMIUM_PATH);
  const newContext = browser.newContext.bind(browser);
  browser.newContext = async (options) => {
    const ctx = await newContext(options);
    await watchPolicy(ctx);
    return ctx;
  };
  browser.newPage = async (options) => (await browser.newContext(options)).newPage();
  return browser;
}

/** Violations seen so far in this test (a test that expects one can read and clear them). */
export function takeCspViolations(): string[] {
  return cspViolations.splice(0);
}

export const PHONE = { width: 390, height: 844 };
export const DESK = { width: 1366, height: 900 };
