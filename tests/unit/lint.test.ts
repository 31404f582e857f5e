// The whole project passes ESLint (Next.js rules, import cycles, the layer boundaries of
// eslint.config.mjs, Drizzle's WHERE guards) with no warning at all.
import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";

test("eslint reports no problem", () => {
  let output = "";
  try {
    execFileSync("node_modules/.bin/eslint", [".", "--max-warnings", "0", "--cache", "--cache-location", ".eslintcache"], {
      encoding: "utf8",
      stdio: "pipe",
    });
  } catch (err) {
    output = String((err as { stdout?: string }).stdout ?? err);
  }
  expect(output).toBe("");
}, 900_000);
