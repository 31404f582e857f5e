// Changing a person's role, home site or suspension: admins only, effective on the very next request.
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { ApiClient, as, type DemoRole } from "../../support/api";
import { db, t } from "../../support/db";
import { siteId, userId } from "../../support/factories";
import { freshPerson, roleOf } from "./fresh-person";

const patchUser = async (id: string, body: unknown, by: DemoRole = "admin") =>
  (await as(by)).json<{ error?: string; fields?: Record<string, string> }>("PATCH", `/api/admin/users/${id}`, body);

describe("roles", () => {
  it("a role change takes effect on the person's next request, without signing in again", async () => {
    const person = await freshPerson("inspector");
    expect((await person.client.get("/api/admin/sites")).status).toBe(403);
    expect((await patchUser(person.id, { role: "admin" })).status).toBe(200);
    expect((await person.client.get("/api/admin/sites")).status).toBe(200);
    expect((await patchUser(person.id, { role: "manager" })).status).toBe(200);
    expect((await person.client.get("/api/admin/sites")).status).toBe(403);
    expect(await roleOf(person.id)).toBe("manager");
  });

  it("refuses a role that does not exist and changes nothing", async () => {
    const person = await freshPerson("analyst");
    for (const role of ["superuser", "", "Admin", 3]) {
      const res = await patchUser(person.id, { role });
      expect(res.status, String(role)).toBe(400);
      expect(res.body.fields?.role).toMatch(/inspector, analyst, engineer, manager, admin/);
    }
    expect(await roleOf(person.id)).toBe("analyst");
  });

  it("an admin cannot demote or suspend themselves", async () => {
    const me = await userId("admin");
    const demote = await patchUser(me, { role: "manager" });
    expect(demote.status).toBe(400);
    expect(demote.body.error).toMatch(/your own admin role/);
    expect(await roleOf(me)).toBe("admin");
    expect((await (await as("admin")).json("POST", `/api/admin/users/${me}/suspend`, {})).status).toBe(400);
    expect((await (await as("admin")).get("/api/admin/sites")).status).toBe(200);
  });

  it("refuses every role but admin, and nothing changes", async () => {
    const person = await freshPerson("inspector");
    for (const role of ["inspector", "analyst", "engineer", "manager"] as DemoRole[]) {
      expect((await patchUser(person.id, { role: "admin" }, role)).status, role).toBe(403);
      expect((await (await as(role)).json("POST", `/api/admin/users/${person.id}/suspend`, {})).status, role).toBe(403);
    }
    expect(await roleOf(person.id)).toBe("inspector");
  });

  it("sets and clears a home site, and refuses one that is not a site id", async () => {
    const person = await freshPerson("inspector");
    const pyc = await siteId("PYC");
    expect((await patchUser(person.id, { siteId: pyc })).status).toBe(200);
    const site = async () => (await db.select({ s: t.user.siteId }).from(t.user).where(eq(t.user.id, person.id)))[0].s;
    expect(await site()).toBe(pyc);
    expect((await patchUser(person.id, { siteId: "PYC" })).status).toBe(400);
    expect(await site()).toBe(pyc);
    expect((await patchUser(person.id, { siteId: null })).status).toBe(200);
    expect(await site()).toBeNull();
  });

  it("suspending signs the person out and keeps them out until restored", async () => {
    const person = await freshPerson("engineer");
    const admin = await as("admin");
    expect((await admin.json("POST", `/api/admin/users/${person.id}/suspend`, { reason: "Left the company" })).status).toBe(200);
    expect((await person.client.get("/api/me/notices")).status).toBe(401);
    const again = await new ApiClient().request("POST", "/api/auth/sign-in/email", { email: person.email, password: person.password });
    expect(again.status).toBe(403);
    expect((await admin.json("DELETE", `/api/admin/users/${person.id}/suspend`)).status).toBe(200);
    const back = await new ApiClient().signIn(person.email, person.password);
    expect((await back.get("/api/me/notices")).status).toBe(200);
  });
});
