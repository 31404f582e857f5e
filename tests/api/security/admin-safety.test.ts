// The last admin stays, one-time links leave stored mail once sent, and the audit log only grows and can be filtered.
import { arrayContains, eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { as, demoUser } from "../../support/api";
import { db, pool, t } from "../../support/db";
import { waitForMail } from "../../support/mail";
import { freshPerson, roleOf, uniqueEmail } from "../admin/fresh-person";

async function activeAdmins() {
  const rows = await db
    .select({ id: t.user.id })
    .from(t.user)
    .where(sql`${t.user.role} = 'admin' and coalesce(${t.user.banned}, false) = false`);
  return rows.length;
}

describe("the last admin", () => {
  it("two admins demoting each other at once leave one admin, and the other is told why", async () => {
    // The demo admin is moved aside for this test so the two fresh admins are the only ones.
    const demo = demoUser("admin");
    const [demoRow] = await db.select({ id: t.user.id }).from(t.user).where(eq(t.user.email, demo.email));
    const a = await freshPerson("admin", "Aino Reyes");
    const b = await freshPerson("admin", "Bram Osei");
    await db.update(t.user).set({ banned: true }).where(eq(t.user.id, demoRow.id));
    try {
      expect(await activeAdmins()).toBe(2);
      const [ra, rb] = await Promise.all([
        a.client.json("PATCH", `/api/admin/users/${b.id}`, { role: "engineer" }),
        b.client.json("PATCH", `/api/admin/users/${a.id}`, { role: "engineer" }),
      ]);
      const statuses = [ra.status, rb.status];
      expect(statuses).toContain(200);
      // The loser is refused by the last-admin rule (or, arriving after, because it is no longer an admin).
      const refused = ra.status === 200 ? rb : ra;
      expect([403, 409]).toContain(refused.status);
      if (refused.status === 409) expect(JSON.stringify(refused.body)).toMatch(/last administrator/);
      expect(await activeAdmins()).toBe(1);
      const survivor = ra.status === 200 ? a : b;
      expect(await roleOf(survivor.id)).toBe("admin");
      const other = survivor === a ? b : a;
      expect(await roleOf(other.id)).toBe("engineer");
    } finally {
      await db.update(t.user).set({ banned: false }).where(eq(t.user.id, demoRow.id));
      await db.update(t.user).set({ role: "engineer" }).where(eq(t.user.id, a.id));
      await db.update(t.user).set({ role: "engineer" }).where(eq(t.user.id, b.id));
    }
  });

  it("two admins suspending each other at once leave one admin", async () => {
    const demo = demoUser("admin");
    const [demoRow] = await db.select({ id: t.user.id }).from(t.user).where(eq(t.user.email, demo.email));
    const a = await freshPerson("admin", "Cleo Marsh");
    const b = await freshPerson("admin", "Dario Lind");
    await db.update(t.user).set({ banned: true }).where(eq(t.user.id, demoRow.id));
    try {
      const [ra, rb] = await Promise.all([
        a.client.json("POST", `/api/admin/users/${b.id}/suspend`, {}),
        b.client.json("POST", `/api/admin/users/${a.id}/suspend`, {}),
      ]);
      const statuses = [ra.status, rb.status];
      expect(statuses).toContain(200);
      // The loser is refused: by the last-admin rule, or (if it arrived after) because its session was ended.
      expect(statuses.filter((s) => s !== 200)).toHaveLength(1);
      expect([401, 409]).toContain(statuses.find((s) => s !== 200));
      expect(await activeAdmins()).toBe(1);
    } finally {
      await db.update(t.user).set({ banned: false }).where(eq(t.user.id, demoRow.id));
      await db.update(t.user).set({ role: "engineer", banned: false }).where(eq(t.user.id, a.id));
      await db.update(t.user).set({ role: "engineer", banned: false }).where(eq(t.user.id, b.id));
    }
  });
});

describe("one-time links", () => {
  it("an invitation's link reaches the mailbox but is removed from the stored copy once sent", async () => {
    const email = uniqueEmail("invitee");
    const res = await (await as("admin")).json("POST", "/api/admin/invitations", { name: "Fen Okafor", email, role: "inspector" });
    expect(res.status).toBe(201);
    const delivered = await waitForMail((m) => m.to.includes(email));
    expect(delivered.text).toMatch(/\/invitation\/[A-Za-z0-9_-]{16,}/);
    let row = (
      await db
        .select()
        .from(t.mailOutbox)
        .where(arrayContains(t.mailOutbox.to, [email]))
    )[0];
    for (let i = 0; i < 20 && row.status !== "sent"; i++) {
      await new Promise((r) => setTimeout(r, 250));
      row = (await db.select().from(t.mailOutbox).where(eq(t.mailOutbox.id, row.id)))[0];
    }
    expect(row.status).toBe("sent");
    expect(row.text).not.toMatch(/\/invitation\/[A-Za-z0-9_-]{8,}/);
    expect(row.html).not.toMatch(/\/invitation\/[A-Za-z0-9_-]{8,}/);
    expect(row.text).toContain("[one-time link removed after sending]");
  });
});

describe("audit log", () => {
  it("refuses any change or removal of an entry", async () => {
    await db.insert(t.auditLog).values({ kind: "sign-in", subject: "append-only-probe@sable-river.example" });
    // The plain driver, so the error text is the database's own and not the query echoed back.
    const probe = "append-only-probe@sable-river.example";
    await expect(pool.query("update audit_log set kind = 'x' where subject = $1", [probe])).rejects.toThrow(
      /audit_log is append-only: UPDATE refused/,
    );
    await expect(pool.query("delete from audit_log where subject = $1", [probe])).rejects.toThrow(
      /audit_log is append-only: DELETE refused/,
    );
    await expect(pool.query("truncate audit_log")).rejects.toThrow(/audit_log is append-only: TRUNCATE refused/);
    expect((await pool.query("select count(*)::int as n from audit_log where subject = $1", [probe])).rows[0].n).toBe(1);
  });

  it("records role changes, invitations and exports, and an admin filters them by kind and person", async () => {
    const admin = await as("admin");
    const person = await freshPerson("inspector", "Gus Amari");
    expect((await admin.json("PATCH", `/api/admin/users/${person.id}`, { role: "analyst" })).status).toBe(200);
    expect((await (await as("analyst")).get("/api/cases/export")).status).toBe(200);
    const byKind = await admin.json<{ entries: { kind: string; subject: string; actorEmail: string; detail: Record<string, unknown> }[] }>(
      "GET",
      `/api/admin/audit?kind=role-change&person=${encodeURIComponent(person.email)}`,
    );
    expect(byKind.status).toBe(200);
    expect(byKind.body.entries).toHaveLength(1);
    expect(byKind.body.entries[0]).toMatchObject({
      kind: "role-change",
      subject: person.email,
      actorEmail: demoUser("admin").email,
      detail: { from: "inspector", to: "analyst" },
    });
    const exports = await admin.json<{ entries: { kind: string; actorEmail: string }[] }>(
      "GET",
      `/api/admin/audit?kind=export&person=${encodeURIComponent(demoUser("analyst").email)}`,
    );
    expect(exports.body.entries.length).toBeGreaterThan(0);
    const today = new Date().toISOString().slice(0, 10);
    const dated = await admin.json<{ entries: unknown[] }>(
      "GET",
      `/api/admin/audit?from=${today}&to=${today}&person=${encodeURIComponent(person.email)}`,
    );
    expect(dated.body.entries.length).toBeGreaterThanOrEqual(2);
    const before = await admin.json<{ entries: unknown[] }>(
      "GET",
      `/api/admin/audit?to=2000-01-01&person=${encodeURIComponent(person.email)}`,
    );
    expect(before.body.entries).toHaveLength(0);
    expect((await admin.json("GET", "/api/admin/audit?kind=no-such-kind")).status).toBe(400);
    for (const role of ["inspector", "analyst", "engineer", "manager"] as const) {
      expect((await (await as(role)).get("/api/admin/audit")).status, role).toBe(403);
    }
    const page = await (await admin.get(`/admin/audit?person=${encodeURIComponent(person.email)}`)).text();
    expect(page).toContain("Role changed");
  });
});
