// The whole project type-checks under strict TypeScript (builds skip this to stay fast).
import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";

test("tsc --noEmit reports no errors", () => {
  let output = "";
  try {
    execFileSync("node_modules/.bin/tsc", ["--noEmit", "-p", "tsconfig.json"], { encoding: "utf8", stdio: "pipe" });
  } catch (err) {
    output = String((err as { stdout?: string }).stdout ?? err);
  }
  expect(output).toBe("");
}, 240_000);
