// Fills the database with a large invented casebook: npm run seed:large -- --cases 100000
// Run after the demo seed (it files cases under the demo sites and people).
import { db, pool } from "../db";
import { seedLargeCases } from "./seed/large-cases";

function option(name: string, fallback: number): number {
  const args = process.argv.slice(2);
  const i = args.indexOf(`--${name}`);
  const raw = i >= 0 ? args[i + 1] : args.find((a) => a.startsWith(`--${name}=`))?.split("=")[1];
  if (raw === undefined) return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1) {
    console.error(`--${name} must be a whole number above 0 (got "${raw}")`);
    process.exit(2);
  }
  return n;
}

const total = option("cases", 100_000);
const seed = option("seed", 1_000_003);
console.log(`generating ${total} cases…`);
const t0 = Date.now();
try {
  const result = await seedLargeCases(db, {
    cases: total,
    seed,
    onProgress: (done, all) => console.log(`  ${done}/${all} cases (${((Date.now() - t0) / 1000).toFixed(1)} s)`),
  });
  console.log(`done: ${result.cases} cases and ${result.findings} findings in ${(result.ms / 1000).toFixed(1)} s`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exitCode = 1;
} finally {
  await pool.end();
}
