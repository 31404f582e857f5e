// Tops the bench database up to the given number of cases with the large invented casebook, then
// does what autovacuum would within a minute of a bulk load (fresh statistics, replaced rows cleared).
//   node_modules/.bin/tsx scripts/bench/support/fill.ts 100000
import { spawnSync } from "node:child_process";
import { Client } from "pg";

const want = Number(process.argv[2]);
if (!Number.isInteger(want) || want < 1) throw new Error("fill.ts wants a number of cases");
const client = new Client({ connectionString: process.env.DATABASE_URL });
await client.connect();
try {
  const count = async () => Number((await client.query<{ n: string }>("select count(*) as n from cases")).rows[0].n);
  const have = await count();
  if (have < want) {
    console.log(`bench: ${have} cases, generating ${want - have} more (npm run seed:large)…`);
    const run = spawnSync("node_modules/.bin/tsx", ["scripts/seed-large.ts", "--cases", String(want - have)], {
      stdio: "inherit",
      env: process.env,
    });
    if (run.status !== 0) throw new Error("seed:large failed");
  }
  // Statistics only when the data changed or a migration just added something to plan with.
  await client.query("vacuum (analyze)");
  console.log(`bench: ${(await count()).toLocaleString("en-US")} cases ready`);
} finally {
  await client.end();
}
