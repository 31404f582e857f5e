// The two stores a backup covers, reached from the same environment the app reads
// (run with tsx --conditions=react-server, as the app's own server code is).
import { GetObjectCommand, ListObjectsV2Command, PutObjectCommand, type S3Client } from "@aws-sdk/client-s3";
import pg from "pg";
import { execFile } from "node:child_process";
import { readdirSync } from "node:fs";
import { promisify } from "node:util";
import { bucket, s3 } from "../../lib/storage/s3";

export const run = promisify(execFile);

function need(name: string): string {
  const v = process.env[name];
  if (!v) throw new Error(`${name} is not set; run this through npm run backup / npm run restore`);
  return v;
}

export function databaseUrl(): string {
  return need("DATABASE_URL");
}

export function pgBin(tool: "pg_dump" | "pg_restore"): string {
  const versions = readdirSync("/usr/lib/postgresql").sort((a, b) => Number(a) - Number(b));
  return `/usr/lib/postgresql/${versions.at(-1)}/bin/${tool}`;
}

export async function withDb<T>(fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: databaseUrl() });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

// Exact counts, table by table, in every schema the app writes (its own and the migrations' journal).
export async function countRows(client: pg.Client): Promise<Record<string, number>> {
  const { rows } = await client.query<{ schemaname: string; tablename: string }>(
    "SELECT schemaname, tablename FROM pg_tables WHERE schemaname NOT IN ('pg_catalog', 'information_schema') ORDER BY 1, 2",
  );
  const counts: Record<string, number> = {};
  for (const t of rows) {
    const name = `${t.schemaname}.${t.tablename}`;
    const res = await client.query<{ n: string }>(`SELECT count(*) AS n FROM "${t.schemaname}"."${t.tablename}"`);
    counts[name] = Number(res.rows[0].n);
  }
  return counts;
}

// The app's own client, so a backup reaches the bucket exactly as the app does.
export function store(): { client: S3Client; bucket: string } {
  return { client: s3(), bucket: bucket() };
}

export async function listKeys(s: ReturnType<typeof store>): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await s.client.send(new ListObjectsV2Command({ Bucket: s.bucket, ContinuationToken: token }));
    for (const o of page.Contents ?? []) if (o.Key) keys.push(o.Key);
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return keys.sort();
}

export async function getBytes(s: ReturnType<typeof store>, key: string): Promise<{ body: Buffer; contentType?: string }> {
  const res = await s.client.send(new GetObjectCommand({ Bucket: s.bucket, Key: key }));
  return { body: Buffer.from(await res.Body!.transformToByteArray()), contentType: res.ContentType };
}

export async function putBytes(s: ReturnType<typeof store>, key: string, body: Buffer, contentType?: string) {
  await s.client.send(
    new PutObjectCommand({ Bucket: s.bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }),
  );
}
