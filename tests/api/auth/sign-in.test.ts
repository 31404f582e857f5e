// Signing in: every demo person lands on their own home; bad input is refused clearly and opens no session.
import { count } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { DEMO_PASSWORD, DEMO_USERS } from "../../../scripts/seed/demo-people";
import { ROLE_LABELS } from "../../../lib/auth/permissions";
import { ApiClient } from "../../support/api";
import { db, t } from "../../support/db";
import { loopback, requestFrom } from "../../support/from-address";

// What each role's home shows first (the role-aware home's panel titles).
const HOME_PANEL: Record<string, string> = {
  inspector: "open field reports",
  analyst: "Waiting for the bench",
  engineer: "Sign-off queue",
  manager: "Recently signed",
  admin: "Sign-off queue",
};

const sessionCount = async () => (await db.select({ n: count() }).from(t.session))[0].n;

function sessionCookie(res: Response): string | undefined {
  return res.headers.getSetCookie().find((c) => /session_token=[^;]+/.test(c) && !/session_token=;/.test(c));
}

describe("sign-in", () => {
  for (const person of DEMO_USERS) {
    it(`${person.email} (${person.role}) signs in and gets their home`, async () => {
      const client = new ApiClient(person.role);
      const res = await client.post("/api/auth/sign-in/email", { email: person.email, password: DEMO_PASSWORD });
      expect(res.status).toBe(200);
      expect(sessionCookie(res)).toBeDefined();
      const home = await client.get("/");
      expect(home.status).toBe(200);
      const html = await home.text();
      expect(html).toContain(person.name);
      expect(html).toContain(`Good to see you, ${person.name.split(" ")[0]}`);
      expect(html).toContain(ROLE_LABELS[person.role]);
      expect(html).toContain(HOME_PANEL[person.role]);
    });
  }

  it("sends an anonymous visitor of the home page to sign-in", async () => {
    const res = await new ApiClient().get("/");
    expect([302, 303, 307, 308]).toContain(res.status);
    expect(res.headers.get("location")).toMatch(/\/sign-in$/);
  });

  const bad: { name: string; body: unknown; status: number; message: RegExp }[] = [
    { name: "an empty form", body: {}, status: 400, message: /email/i },
    { name: "an empty e-mail and password", body: { email: "", password: "" }, status: 400, message: /email/i },
    { name: "a malformed e-mail", body: { email: "dana-at-sable-river", password: DEMO_PASSWORD }, status: 400, message: /email/i },
    {
      name: "a wrong password",
      body: { email: DEMO_USERS[0].email, password: "not-the-password" },
      status: 401,
      message: /invalid email or password/i,
    },
    {
      name: "an unknown person",
      body: { email: "nobody@sable-river.example", password: DEMO_PASSWORD },
      status: 401,
      message: /invalid email or password/i,
    },
  ];

  bad.forEach((attempt, i) => {
    it(`refuses ${attempt.name} with a clear error and opens no session`, async () => {
      const before = await sessionCount();
      const client = new ApiClient();
      // Failing on purpose: each from its own address, so the shared one stays under the sign-in limit.
      const res = await requestFrom(loopback(212, i + 1), "POST", "/api/auth/sign-in/email", attempt.body);
      expect(res.status).toBe(attempt.status);
      expect(String(res.json.message)).toMatch(attempt.message);
      expect((res.headers["set-cookie"] ?? []).some((c) => /session_token=[^;]+/.test(c) && !/session_token=;/.test(c))).toBe(false);
      expect(await sessionCount()).toBe(before);
      // Still anonymous afterwards.
      expect((await client.get("/api/me/notices")).status).toBe(401);
    });
  });
});
