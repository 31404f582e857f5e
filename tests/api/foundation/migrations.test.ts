// The committed migrations build a working schema from an empty database.
import { randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";
import path from "node:path";
import { getTableConfig, type PgTable } from "drizzle-orm/pg-core";
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { is } from "drizzle-orm";
import { PgTable as PgTableClass } from "drizzle-orm/pg-core";
import { Pool } from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as schema from "../../../db/schema";
import { pool } from "../../support/db";

const MIGRATIONS = path.resolve(import.meta.dirname, "../../../db/migrations");
const name = `tl_migrate_${randomBytes(6).toString("hex")}`;
let fresh: Pool;

// The tables Tearline cannot work without, named here so a schema file dropped by mistake is noticed.
const CORE_TABLES = [
  "user",
  "session",
  "account",
  "verification",
  "sites",
  "invitations",
  "code_entries",
  "cases",
  "case_counters",
  "findings",
  "case_events",
  "case_links",
  "photos",
  "mail_outbox",
];

beforeAll(async () => {
  await pool.query(`CREATE DATABASE ${name}`);
  const url = new URL(process.env.DATABASE_URL!);
  url.pathname = `/${name}`;
  fresh = new Pool({ connectionString: url.toString(), max: 2 });
  fresh.on("error", (err) => console.warn(`migration test pool: ${err.message}`));
});

afterAll(async () => {
  await fresh?.end();
  // end() can resolve while a backend is still closing; forcing the drop then kills a socket the
  // ended pool no longer listens on (an uncaught error). Wait for the backends to go first.
  for (let i = 0; i < 50; i++) {
    const { rows } = await pool.query(`select count(*)::int as n from pg_stat_activity where datname = $1`, [name]);
    if (rows[0].n === 0) break;
    await new Promise((r) => setTimeout(r, 100));
  }
  await pool.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
});

describe("migrations on an empty database", () => {
  it("start from nothing", async () => {
    const { rows } = await fresh.query(`select count(*)::int as n from information_schema.tables where table_schema = 'public'`);
    expect(rows[0].n).toBe(0);
  });

  it("apply cleanly, every one recorded, and a second run changes nothing", async () => {
    const db = drizzle(fresh);
    await migrate(db, { migrationsFolder: MIGRATIONS });
    const journal = JSON.parse(readFileSync(path.join(MIGRATIONS, "meta/_journal.json"), "utf8")) as { entries: unknown[] };
    const applied = await fresh.query(`select count(*)::int as n from drizzle.__drizzle_migrations`);
    expect(applied.rows[0].n).toBe(journal.entries.length);
    await migrate(db, { migrationsFolder: MIGRATIONS });
    expect((await fresh.query(`select count(*)::int as n from drizzle.__drizzle_migrations`)).rows[0].n).toBe(journal.entries.length);
  });

  it("create every table the schema declares, the core ones included", async () => {
    const { rows } = await fresh.query<{ table_name: string }>(
      `select table_name from information_schema.tables where table_schema = 'public'`,
    );
    const present = new Set(rows.map((r) => r.table_name));
    const declared = (Object.values(schema) as unknown[])
      .filter((v): v is PgTable => is(v, PgTableClass))
      .map((table) => getTableConfig(table).name);
    expect(declared).toEqual(expect.arrayContaining(CORE_TABLES));
    expect(declared.filter((n) => !present.has(n))).toEqual([]);
  });

  it("create each declared column", async () => {
    const { rows } = await fresh.query<{ table_name: string; column_name: string }>(
      `select table_name, column_name from information_schema.columns where table_schema = 'public'`,
    );
    const present = new Set(rows.map((r) => `${r.table_name}.${r.column_name}`));
    const missing = (Object.values(schema) as unknown[])
      .filter((v): v is PgTable => is(v, PgTableClass))
      .flatMap((table) => {
        const config = getTableConfig(table);
        return config.columns.map((c) => `${config.name}.${c.name}`);
      })
      .filter((c) => !present.has(c));
    expect(missing).toEqual([]);
  });

  it("install pg_trgm, so similarity search works", async () => {
    const ext = await fresh.query(`select extname from pg_extension where extname = 'pg_trgm'`);
    expect(ext.rowCount).toBe(1);
    // similarity = shared trigrams / all distinct trigrams of both (pg_trgm documentation, "Trigram Concepts"; from memory).
    // "spalling" has 9 padded trigrams, "spaling" 8, 7 shared: 7 / (9 + 8 - 7) = 0.7 (arithmetic).
    const { rows } = await fresh.query(`select similarity('spalling', 'spaling') as s`);
    expect(Number(rows[0].s)).toBeCloseTo(0.7, 6);
  });
});
