// What a backup folder promises: the row count of every table and the SHA-256 of every object.
// Pure, so restore can say exactly what differs before anyone trusts the copy.
import { createHash } from "node:crypto";

export type ObjectEntry = { key: string; bytes: number; sha256: string; contentType?: string };
export type Manifest = {
  format: "tearline-backup/1";
  createdAt: string;
  database: { dumpFile: string; dumpSha256: string; tables: Record<string, number> };
  objects: ObjectEntry[];
};

export function sha256(data: Buffer | string): string {
  return createHash("sha256").update(data).digest("hex");
}

// Object keys become file paths inside the folder: refuse anything that could leave it.
export function safeObjectPath(key: string): string {
  if (!key || key.length > 1024 || key.startsWith("/") || key.split("/").some((p) => p === ".." || p === "." || p === "")) {
    throw new Error(`object key "${key}" cannot be stored as a file`);
  }
  return key;
}

export function compareTables(expected: Record<string, number>, actual: Record<string, number>): string[] {
  const problems: string[] = [];
  for (const name of new Set([...Object.keys(expected), ...Object.keys(actual)])) {
    if (!(name in actual)) problems.push(`table ${name} is missing`);
    else if (!(name in expected)) problems.push(`table ${name} is not in the backup`);
    else if (expected[name] !== actual[name]) problems.push(`table ${name} has ${actual[name]} rows, the backup ${expected[name]}`);
  }
  return problems.sort();
}

export function compareObjects(expected: ObjectEntry[], actual: ObjectEntry[]): string[] {
  const problems: string[] = [];
  const found = new Map(actual.map((o) => [o.key, o]));
  for (const want of expected) {
    const got = found.get(want.key);
    if (!got) problems.push(`object ${want.key} is missing`);
    else if (got.sha256 !== want.sha256 || got.bytes !== want.bytes) problems.push(`object ${want.key} differs from the backup`);
    found.delete(want.key);
  }
  for (const extra of found.keys()) problems.push(`object ${extra} is not in the backup`);
  return problems.sort();
}

export function parseManifest(text: string): Manifest {
  const m = JSON.parse(text) as Manifest;
  if (m?.format !== "tearline-backup/1" || !m.database?.tables || !Array.isArray(m.objects)) {
    throw new Error("this folder's manifest.json is not a Tearline backup");
  }
  return m;
}
