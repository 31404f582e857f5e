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

// Timeouts so an outage answers quickly instead of hanging a request: a connection must open in
// 10 s (a refused connection fails at once; this bounds a black-holed host or a long wait for a free
// pooled connection), a statement finish in 30 s, and a transaction left idle is ended by the server after 30 s.
// Scripts (migrations, seeds, backups) run without the two server-side limits; PG_STATEMENT_TIMEOUT_MS overrides.
function createPool(): Pool {
  const inApp = Boolean(process.env.NEXT_RUNTIME);
  const created = new Pool({
    connectionString: databaseUrl(),
    max: Number(process.env.PG_POOL_MAX ?? 10),
    connectionTimeoutMillis: 10_000,
    idleTimeoutMillis: 30_000,
    statement_timeout: Number(process.env.PG_STATEMENT_TIMEOUT_MS ?? (inApp ? 30_000 : 0)),
    idle_in_transaction_session_timeout: inApp ? 30_000 : 0,
    keepAlive: true,
  });
  // An idle connection dropped by the server (restart, failover, network) emits 'error' on the pool;
  // without a listener that would end the process. The pool discards the client and opens a new one.
  created.on("error", (err) => console.error(`database connection lost (the pool will reconnect): ${err.message}`));
  return created;
}

export const pool = globalForDb.tearlinePool ?? createPool();
globalForDb.tearlinePool = pool;

export const db = drizzle(pool, { schema, casing: "snake_case" });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
export { schema };
