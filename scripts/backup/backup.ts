// npm run backup [-- FOLDER]: one folder holding a pg_dump (custom format), every object of the
// bucket, and manifest.json with each table's row count and each object's SHA-256.
import { mkdirSync, readFileSync, writeFileSync, existsSync, readdirSync } from "node:fs";
import path from "node:path";
import { sha256, safeObjectPath, type Manifest, type ObjectEntry } from "../../lib/backup/manifest";
import { countRows, databaseUrl, getBytes, listKeys, pgBin, run, store, withDb } from "./sources";

const stamp = new Date().toISOString().replace(/[-:]/g, "").replace(/\..*/, "").replace("T", "-");
const folder = path.resolve(process.argv[2] ?? path.join("backups", `tearline-${stamp}`));
if (existsSync(folder) && readdirSync(folder).length > 0) {
  console.error(`[tearline] ${folder} is not empty; give a new folder`);
  process.exit(1);
}
mkdirSync(path.join(folder, "objects"), { recursive: true });

// Counts and dump come from one snapshot, so the manifest matches the dump even while people work.
const dumpFile = "database.dump";
const tables = await withDb(async (client) => {
  await client.query("BEGIN ISOLATION LEVEL REPEATABLE READ READ ONLY");
  const { rows } = await client.query<{ snap: string }>("SELECT pg_export_snapshot() AS snap");
  const counts = await countRows(client);
  await run(pgBin("pg_dump"), [
    "--format=custom",
    "--no-owner",
    "--no-privileges",
    `--snapshot=${rows[0].snap}`,
    "--file",
    path.join(folder, dumpFile),
    databaseUrl(),
  ]);
  await client.query("COMMIT");
  return counts;
});

const s = store();
const objects: ObjectEntry[] = [];
for (const key of await listKeys(s)) {
  const { body, contentType } = await getBytes(s, key);
  const file = path.join(folder, "objects", safeObjectPath(key));
  mkdirSync(path.dirname(file), { recursive: true });
  writeFileSync(file, body);
  objects.push({ key, bytes: body.length, sha256: sha256(body), contentType });
}

const manifest: Manifest = {
  format: "tearline-backup/1",
  createdAt: new Date().toISOString(),
  database: { dumpFile, dumpSha256: sha256(readFileSync(path.join(folder, dumpFile))), tables },
  objects,
};
writeFileSync(path.join(folder, "manifest.json"), JSON.stringify(manifest, null, 2) + "\n");
const rows = Object.values(tables).reduce((a, b) => a + b, 0);
console.log(`[tearline] backup written to ${folder}: ${Object.keys(tables).length} tables, ${rows} rows, ${objects.length} objects`);
