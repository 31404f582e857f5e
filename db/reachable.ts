// Whether the database answers right now, for the page outage check in proxy.ts. A pool of its own
// (one connection, short limits) so a busy app pool never reads as an outage, and requests that
// arrive together share one probe. A failed probe is remembered for a second so an outage costs
// one connection attempt per second, not one per request.
import { Pool } from "pg";

const DOWN_REMEMBERED_MS = 1000;
const state = globalThis as unknown as { tearlineProbe?: { pool: Pool; inFlight?: Promise<boolean>; downUntil: number } };

function probe() {
  state.tearlineProbe ??= {
    pool: new Pool({
      connectionString: process.env.DATABASE_URL,
      max: 1,
      connectionTimeoutMillis: 3000,
      query_timeout: 3000,
      idleTimeoutMillis: 60_000,
    }),
    downUntil: 0,
  };
  // A dropped idle connection must not end the process; the next probe opens a new one.
  if (state.tearlineProbe.pool.listenerCount("error") === 0) state.tearlineProbe.pool.on("error", () => undefined);
  return state.tearlineProbe;
}

export async function databaseReachable(): Promise<boolean> {
  const p = probe();
  if (Date.now() < p.downUntil) return false;
  p.inFlight ??= p.pool
    .query("select 1")
    .then(() => true)
    .catch(() => {
      p.downUntil = Date.now() + DOWN_REMEMBERED_MS;
      return false;
    })
    .finally(() => {
      p.inFlight = undefined;
    });
  return p.inFlight;
}
