// Loads the invented demo scenario. Safe to run twice: an already seeded database is left alone
// unless --reset is given. Photos go through the app's server code, so run it as
// `tsx --conditions=react-server scripts/seed-demo.ts` (npm run seed:demo does); --no-photos skips them.
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
  // Photos need the server code and the object store: check both before touching any data.
  const demoPhotos = args.has("--no-photos") ? null : await prepareDemoPhotos();
  const started = Date.now();
  if (args.has("--reset")) await resetAll(db);
  await seedCodeLists(db);
  await seedSitesAndPeople(db);
  log("demo sites, people and code lists loaded");
  const loaded = await seedDemoCases(db);
  log(
    `demo casebook loaded: ${loaded.cases} cases, ${loaded.findings} findings, ${loaded.events} history entries, ${loaded.links} links (${Date.now() - started} ms)`,
  );
  if (demoPhotos) {
    const photosStarted = Date.now();
    const shots = await demoPhotos.seedDemoPhotos(db);
    const swept = args.has("--reset") ? await demoPhotos.removeUnusedPhotoObjects() : 0;
    log(
      `demo photos attached: ${shots.photos} photos on ${shots.cases} cases${swept ? `, ${swept} objects of earlier photos removed` : ""} (${Date.now() - photosStarted} ms)`,
    );
  }
}
await pool.end();

/** The photo seeding imports server-only modules, which load only under the react-server condition. */
async function prepareDemoPhotos() {
  const stop = (why: string) => {
    console.error(`demo photos: ${why}`);
    process.exit(1);
  };
  if (!import.meta.resolve("server-only").endsWith("empty.js")) {
    stop("run the seed with `tsx --conditions=react-server scripts/seed-demo.ts` (npm run seed:demo does), or pass --no-photos");
  }
  const photos = await import("./seed/demo-photos/seed-photos");
  await photos.requireObjectStore().catch((err: Error) => stop(err.message));
  return photos;
}
