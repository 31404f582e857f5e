// Direct database access for assertions ("nothing was written") and for building test fixtures.
import { pool } from "../../db";
export { db, pool } from "../../db";
export * as t from "../../db/schema";

/** The tables a request can change through the API (sessions and the audit log move on reads, so they are left out). */
export const TOUCHED_TABLES = [
  "cases",
  "findings",
  "photos",
  "case_events",
  "case_links",
  "sites",
  "code_entries",
  "invitations",
  "fleet_units",
  "user",
  "mail_outbox",
  "case_counters",
] as const;

/** Tables that background work rewrites on its own (mail delivery marks rows sent): only their row count is compared. */
const COUNT_ONLY = new Set(["mail_outbox"]);

export type TableState = Record<string, { rows: number; hash: string }>;

/**
 * Row count and a hash of every row of each table, so a test can show a refused request
 * changed nothing: equal snapshots before and after mean no row was added, removed or altered.
 */
export async function tableState(tables: readonly string[] = TOUCHED_TABLES): Promise<TableState> {
  const state: TableState = {};
  for (const name of tables) {
    if (!/^[a-z_]+$/.test(name)) throw new Error(`not a table name: ${name}`);
    const { rows } = await pool.query<{ rows: string; hash: string | null }>(
      COUNT_ONLY.has(name)
        ? `select count(*)::text as rows, '' as hash from "${name}"`
        : `select count(*)::text as rows, md5(coalesce(string_agg(r::text, '|' order by r::text), '')) as hash from "${name}" r`,
    );
    state[name] = { rows: Number(rows[0].rows), hash: rows[0].hash ?? "" };
  }
  return state;
}

/** Names of the tables whose count or content differ between two snapshots. */
export function changedTables(before: TableState, after: TableState): string[] {
  return Object.keys(before).filter((k) => before[k].rows !== after[k]?.rows || before[k].hash !== after[k]?.hash);
}
