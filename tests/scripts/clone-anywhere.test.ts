import { afterAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { freePort } from "../support/free-port";

// A newcomer may clone into a 0700 folder (root's home, mktemp -d) that the postgres user cannot
// enter; the private PostgreSQL must still start, stop, start over and clean up after itself.
const project = path.resolve(import.meta.dirname, "../..");
const parent = mkdtempSync(path.join(tmpdir(), "tearline-clone-")); // created 0700
const clone = path.join(parent, "tl");
const dataDir = path.join(clone, ".probe-data");
const isRoot = process.getuid?.() === 0;

function pg(port: number, command: "start" | "stop" | "remove"): string {
  return execFileSync("bash", ["scripts/services/pg.sh", command], {
    cwd: clone,
    encoding: "utf8",
    env: {
      ...process.env,
      TEARLINE_DATA_DIR: dataDir,
      PG_PORT: String(port),
      PG_PURPOSE: "probe",
      PG_PASSWORD: "probe-pw",
      PG_DB: "probe",
    },
  });
}

function sql(port: number, query: string): string {
  const bin = execFileSync("bash", ["-c", "ls -d /usr/lib/postgresql/*/bin | sort -V | tail -1"], { encoding: "utf8" }).trim();
  return execFileSync(`${bin}/psql`, ["-h", "127.0.0.1", "-p", String(port), "-U", "tearline", "-d", "probe", "-tAc", query], {
    encoding: "utf8",
    env: { ...process.env, PGPASSWORD: "probe-pw" },
  }).trim();
}

afterAll(() => {
  if (existsSync(clone)) {
    try {
      pg(0, "remove");
    } catch {
      /* already gone */
    }
  }
  rmSync(parent, { recursive: true, force: true });
});

describe("private PostgreSQL in a clone inside a 0700 folder", () => {
  it("starts, accepts a connection, starts over after its data folder is deleted, and leaves nothing behind", async () => {
    expect(statSync(parent).mode & 0o777).toBe(0o700);
    execFileSync("git", ["-c", "safe.directory=*", "clone", "--quiet", project, clone]);
    const port = await freePort();

    pg(port, "start");
    expect(sql(port, "SELECT 1")).toBe("1");
    const pointer = path.join(dataDir, "pg-elsewhere");
    // As root the postgres user cannot pass the 0700 folder, so the cluster is kept under /var/tmp;
    // any other user owns the whole path and keeps it in the project.
    const elsewhere = isRoot ? readFileSync(pointer, "utf8").trim() : "";
    if (isRoot) {
      expect(elsewhere).toMatch(/^\/var\/tmp\/tearline-tl-[0-9a-f]{8}-probe$/);
      expect(statSync(elsewhere).mode & 0o777).toBe(0o700);
      expect(statSync(parent).mode & 0o777).toBe(0o700); // nothing loosened
    } else {
      expect(existsSync(pointer)).toBe(false);
      expect(existsSync(path.join(dataDir, "pg", "PG_VERSION"))).toBe(true);
    }
    sql(port, "CREATE TABLE left_from_before (id int)");
    pg(port, "stop");

    // Starting over: deleting the data folder gives a fresh cluster, even one kept elsewhere.
    rmSync(dataDir, { recursive: true, force: true });
    pg(port, "start");
    expect(sql(port, "SELECT count(*) FROM pg_tables WHERE tablename = 'left_from_before'")).toBe("0");
    pg(port, "remove");

    expect(existsSync(dataDir)).toBe(false);
    if (isRoot) expect(existsSync(elsewhere)).toBe(false);
  }, 120_000);
});
