// The bench's last word: every figure at the full size with its target and floor, the growth line
// from the smaller size, and a non-zero exit when any target was missed.
//   tsx scripts/bench/support/summary.ts <growth cases> <full cases>
import { readFileSync } from "node:fs";
import type { Figure } from "./figures";

const [small, full] = process.argv.slice(2).map(Number);
const all: Figure[] = readFileSync(process.env.BENCH_RESULTS!, "utf8")
  .split("\n")
  .filter(Boolean)
  .map((l) => JSON.parse(l));
const at = (n: number) => all.filter((f) => f.cases === n);
const smallByName = new Map(at(small).map((f) => [f.name, f]));
// From 100,000 cases up, a hot path may grow at most 3× over a tenfold casebook.
const GROWTH_LIMIT = small >= 100_000 ? 3 : null;

const n = (x: number | undefined, unit: string) => (x === undefined ? "" : unit === "s" ? x.toFixed(2) : x.toFixed(1));
const rows = at(full).map((f) => {
  const before = smallByName.get(f.name);
  const growth = before && f.unit !== "kB" ? f.p95 / before.p95 : undefined;
  const grewTooMuch = GROWTH_LIMIT !== null && growth !== undefined && growth > GROWTH_LIMIT;
  return {
    figure: f.name,
    unit: f.unit,
    p50: n(f.p50, f.unit),
    p95: n(f.p95, f.unit),
    target: f.target === undefined ? "" : `${f.targetOn ?? "p95"} ≤ ${f.target}`,
    floor: n(f.floorP95, f.unit),
    ratio: f.ratio === undefined ? "" : `×${f.ratio.toFixed(2)}`,
    [`p95 at ${small.toLocaleString("en-US")}`]: n(before?.p95, f.unit),
    growth: growth === undefined ? "" : `×${growth.toFixed(2)}`,
    verdict: f.ok && !grewTooMuch ? "OK" : grewTooMuch ? "GREW" : "MISSED",
  };
});
console.log(`Figures at ${full.toLocaleString("en-US")} cases (growth from ${small.toLocaleString("en-US")}):`);
console.table(rows);
const missed = rows.filter((r) => r.verdict !== "OK");
if (missed.length) {
  console.log(`${missed.length} figure(s) missed: ${missed.map((r) => r.figure).join("; ")}`);
  process.exitCode = 1;
} else console.log(`all ${rows.length} figures within target`);
