// db/search-index.sql is the readable whole of the search index; the migrations built it in steps.
// Here the migrated database must hold exactly what the file says: every function body, every
// trigger, and nothing of the index that the file leaves out.
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { sql } from "drizzle-orm";
import { db } from "../../support/db";

const FILE = readFileSync(path.resolve(import.meta.dirname, "../../../db/search-index.sql"), "utf8");
const squash = (s: string) => s.replace(/\s+/g, " ").trim();

function fileFunctions(): Map<string, string> {
  const out = new Map<string, string>();
  for (const m of FILE.matchAll(/CREATE OR REPLACE FUNCTION (\w+)\([^)]*\)[^$]*\$\$([\s\S]*?)\$\$;/g)) out.set(m[1], m[2]);
  return out;
}

function fileTriggers(): Map<string, string> {
  const out = new Map<string, string>();
  for (const m of FILE.matchAll(/^(CREATE (?:CONSTRAINT )?TRIGGER (\w+) [^;]+);$/gm)) out.set(m[2], m[1]);
  return out;
}

describe("the search index file", () => {
  test("every search function in the database has the body the file gives, and the file names them all", async () => {
    const { rows } = await db.execute<{ name: string; body: string }>(
      sql`select proname as name, prosrc as body from pg_proc where proname like 'tl\\_%search%' and pronamespace = 'public'::regnamespace`,
    );
    const inFile = fileFunctions();
    expect([...inFile.keys()].sort()).toEqual(rows.map((r) => r.name).sort());
    for (const r of rows) expect(squash(inFile.get(r.name)!), r.name).toBe(squash(r.body));
  });

  test("every trigger that feeds the index is as the file writes it", async () => {
    const { rows } = await db.execute<{ name: string; def: string }>(sql`
      select t.tgname as name, pg_get_triggerdef(t.oid) as def from pg_trigger t
      join pg_proc p on p.oid = t.tgfoid
      where not t.tgisinternal and p.proname like 'tl\\_%search%'`);
    const inFile = fileTriggers();
    expect([...inFile.keys()].sort()).toEqual(rows.map((r) => r.name).sort());
    for (const r of rows) expect(squash(inFile.get(r.name)!), r.name).toBe(squash(r.def));
  });

  test("the pending queue exists as the file creates it", async () => {
    const { rows } = await db.execute<{ column_name: string; data_type: string }>(
      sql`select column_name, data_type from information_schema.columns where table_name = 'search_pending' order by ordinal_position`,
    );
    expect(rows.map((r) => `${r.column_name} ${r.data_type}`)).toEqual(["txid bigint", "ids ARRAY"]);
    expect(FILE).toContain("CREATE UNLOGGED TABLE IF NOT EXISTS search_pending (txid bigint NOT NULL, ids uuid[] NOT NULL);");
  });
});
