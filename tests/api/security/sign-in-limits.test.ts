// Sign-in limits: failures count per socket address (no header resets them) and per account; good sign-ins never count.
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { DEMO_PASSWORD } from "../../../scripts/seed/demo-people";
import { as, demoUser } from "../../support/api";
import { db, t } from "../../support/db";
import { loopback, signInFrom } from "../../support/from-address";
import { freshPerson, uniqueEmail } from "../admin/fresh-person";

describe("sign-in limits", () => {
  it("refuses an address with 429 after 5 failures, whatever X-Forwarded-For it sends", async () => {
    const address = loopback(201, 1);
    for (let i = 0; i < 5; i++) {
      const res = await signInFrom(address, uniqueEmail("nobody"), "not-the-password", { "x-forwarded-for": `10.9.${i}.${i + 1}` });
      expect(res.status, `attempt ${i + 1}`).toBe(401);
    }
    // Even the right password of a real person, and a fresh forwarded address, waits now.
    const sixth = await signInFrom(address, demoUser("manager").email, DEMO_PASSWORD, { "x-forwarded-for": "203.0.113.77" });
    expect(sixth.status).toBe(429);
    expect(String(sixth.json.message)).toMatch(/too many failed sign-ins from this address/i);
    expect(Number(sixth.headers["retry-after"])).toBeGreaterThan(0);
    // Another address is not affected.
    expect((await signInFrom(loopback(201, 2), demoUser("manager").email, DEMO_PASSWORD)).status).toBe(200);
  });

  it("lets 30 good sign-ins from one address within a minute all through", async () => {
    const address = loopback(202, 1);
    const started = Date.now();
    for (let i = 0; i < 30; i++) {
      const res = await signInFrom(address, demoUser("analyst").email, DEMO_PASSWORD);
      expect(res.status, `sign-in ${i + 1}`).toBe(200);
    }
    expect(Date.now() - started).toBeLessThan(60_000);
  });

  it("locks an account after 5 failures from different addresses, says so, and an admin can unlock it", async () => {
    const person = await freshPerson("inspector", "Lotte Abara");
    for (let i = 1; i <= 5; i++) {
      expect((await signInFrom(loopback(203, i), person.email, "wrong-password-here")).status).toBe(401);
    }
    const locked = await signInFrom(loopback(203, 20), person.email, person.password);
    expect(locked.status).toBe(429);
    expect(locked.json.code).toBe("account-locked");
    expect(String(locked.json.message)).toMatch(/account is locked .* after 5 failed sign-ins\. An administrator can unlock it/i);

    // Only an admin may unlock.
    expect((await (await as("manager")).post(`/api/admin/users/${person.id}/unlock`, {})).status).toBe(403);
    const people = await (await as("admin")).get("/admin/users");
    expect(await people.text()).toContain("Sign-in locked");
    expect((await (await as("admin")).post(`/api/admin/users/${person.id}/unlock`, {})).status).toBe(200);
    expect((await signInFrom(loopback(203, 21), person.email, person.password)).status).toBe(200);

    // Each step is in the audit log, the failures with the address they came from.
    const rows = await db.select().from(t.auditLog).where(eq(t.auditLog.subject, person.email));
    const kinds = rows.map((r) => r.kind);
    expect(kinds).toEqual(expect.arrayContaining(["sign-in-failed", "account-locked", "account-unlocked", "sign-in"]));
    const failed = rows.filter((r) => r.kind === "sign-in-failed").map((r) => r.address);
    expect(failed).toEqual(expect.arrayContaining([loopback(203, 1), loopback(203, 5)]));
    const unlock = await db
      .select()
      .from(t.auditLog)
      .where(and(eq(t.auditLog.subject, person.email), eq(t.auditLog.kind, "account-unlocked")));
    expect(unlock[0].actorEmail).toBe(demoUser("admin").email);
  });
});
