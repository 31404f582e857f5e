// Loads the invented demo scenario. Safe to run twice: an already seeded database is left alone
// unless --reset is given.
import { sql } from "drizzle-orm";
import { db, pool } from "../db";
import { resetAll, seedCodeLists, seedSitesAndPeople } from "./seed/base";
import { seedDemoCases } from "./seed/demo-cases";

const args = new Set(process.argv.slice(2));
const log = (m: string) => !args.has("--quiet") && console.log(m);

const [{ count }] = (await db.execute(sql`select count(*)::int as count from sites`)).rows as [{ count: number }];
if (count > 0 && !args.has("--reset")) {
  log("demo data already loaded (run with --reset to start over)");
} else {
  const started = Date.now();
  if (args.has("--reset")) await resetAll(db);
  await seedCodeLists(db);
  await seedSitesAndPeople(db);
  log("demo sites, people and code lists loaded");
  const loaded = await seedDemoCases(db);
  log(`demo casebook loaded: ${loaded.cases} cases, ${loaded.findings} findings, ${loaded.events} history entries, ${loaded.links} links (${Date.now() - started} ms)`);
}
await pool.end();
