// npm run restore -- FOLDER: loads a backup into an empty database and bucket, then checks every
// table's row count and every object's SHA-256 against the manifest. Refuses a store that has data.
import { readFileSync } from "node:fs";
import path from "node:path";
import { compareObjects, compareTables, parseManifest, safeObjectPath, sha256, type ObjectEntry } from "../../lib/backup/manifest";
import { countRows, databaseUrl, getBytes, listKeys, pgBin, putBytes, run, store, withDb } from "./sources";

const fail = (message: string): never => {
  console.error(`[tearline] ${message}`);
  process.exit(1);
};

const folder = process.argv[2] ? path.resolve(process.argv[2]) : fail("usage: npm run restore -- FOLDER");
const manifest = parseManifest(readFileSync(path.join(folder, "manifest.json"), "utf8"));

// Check the folder itself first: a damaged backup must not half-load. Objects are read one at a
// time (again when uploading), so a large bucket never has to fit in memory.
const dumpPath = path.join(folder, manifest.database.dumpFile);
const objectFile = (key: string) => readFileSync(path.join(folder, "objects", safeObjectPath(key)));
if (sha256(readFileSync(dumpPath)) !== manifest.database.dumpSha256) fail("the database dump does not match its SHA-256 in the manifest");
for (const o of manifest.objects) {
  if (sha256(objectFile(o.key)) !== o.sha256) fail(`object ${o.key} in the folder does not match its SHA-256`);
}

const s = store();
const tablesNow = await withDb((c) =>
  c.query("SELECT count(*)::int AS n FROM pg_tables WHERE schemaname NOT IN ('pg_catalog', 'information_schema')"),
);
if (tablesNow.rows[0].n > 0) fail("the database is not empty; stop Tearline, move its data folder aside and run the restore again");
if ((await listKeys(s)).length > 0)
  fail(`the bucket ${s.bucket} is not empty; stop Tearline, move its data folder aside and run the restore again`);

await run(pgBin("pg_restore"), ["--no-owner", "--no-privileges", "--exit-on-error", "--dbname", databaseUrl(), dumpPath]);
for (const o of manifest.objects) await putBytes(s, o.key, objectFile(o.key), o.contentType);

const restored: ObjectEntry[] = [];
for (const key of await listKeys(s)) {
  const { body } = await getBytes(s, key);
  restored.push({ key, bytes: body.length, sha256: sha256(body) });
}
const problems = [...compareTables(manifest.database.tables, await withDb(countRows)), ...compareObjects(manifest.objects, restored)];
if (problems.length) fail(`the restored copy differs from the backup:\n  ${problems.join("\n  ")}`);
const rows = Object.values(manifest.database.tables).reduce((a, b) => a + b, 0);
console.log(
  `[tearline] restored ${folder}: ${Object.keys(manifest.database.tables).length} tables, ${rows} rows and ${manifest.objects.length} objects, all matching the manifest`,
);
