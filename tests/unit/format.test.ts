// Every source file is as Prettier writes it (.prettierrc.json; .prettierignore leaves out generated
// files, migrations and prose), so a diff shows what changed and never how it was spaced.
import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";

test("prettier finds every file formatted", () => {
  let output = "";
  try {
    execFileSync("node_modules/.bin/prettier", ["--check", ".", "--log-level", "warn"], { encoding: "utf8", stdio: "pipe" });
  } catch (err) {
    const e = err as { stdout?: string; stderr?: string };
    output = `${e.stdout ?? ""}${e.stderr ?? ""}` || String(err);
  }
  expect(output).toBe("");
}, 300_000);
