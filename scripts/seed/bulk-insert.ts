// Fast multi-row inserts: the whole batch travels as one JSON parameter and PostgreSQL unpacks it
// with json_populate_recordset, which is much cheaper than tens of thousands of bound parameters.
import { sql } from "drizzle-orm";
import type { Db, Tx } from "../../db";

const snake = (key: string) => key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** Inserts rows that all have the same keys (camelCase, as the Drizzle schema names them). */
export async function bulkInsert(db: Db | Tx, table: "cases" | "findings", rows: readonly Record<string, unknown>[]): Promise<void> {
  if (rows.length === 0) return;
  const keys = Object.keys(rows[0]);
  const columns = sql.raw(keys.map((k) => `"${snake(k)}"`).join(", "));
  const payload = JSON.stringify(rows.map((r) => Object.fromEntries(keys.map((k) => [snake(k), r[k] ?? null]))));
  await db.execute(
    sql`insert into ${sql.raw(table)} (${columns}) select ${columns} from json_populate_recordset(null::${sql.raw(table)}, ${payload}::json)`,
  );
}
