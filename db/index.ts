// One database client for the app, scripts and tests; the URL comes from the environment.
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

const globalForDb = globalThis as unknown as { tearlinePool?: Pool };

function databaseUrl(): string | undefined {
  const url = process.env.DATABASE_URL;
  if (!url) console.warn("DATABASE_URL is not set: start Tearline through the README's commands");
  return url;
}

export const pool = globalForDb.tearlinePool ?? new Pool({ connectionString: databaseUrl(), max: 10 });
globalForDb.tearlinePool = pool;

export const db = drizzle(pool, { schema, casing: "snake_case" });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
export { schema };
