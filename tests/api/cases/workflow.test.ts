// The whole life of a case over the API: filed, received, findings, verdict, sign-off, sign, reopen,
// with the e-mails each step sends read back from the mail fake.
import { eq } from "drizzle-orm";
import { describe, expect, test } from "vitest";
import { ApiClient, as, demoUser } from "../../support/api";
import { db, t } from "../../support/db";
import { waitForMail } from "../../support/mail";
import { signVerdict } from "../../support/sign";
import { fieldReport } from "./fixtures";

type CaseBody = {
  case: { id: string; number: string; version: number; status: string; fieldCall: string; endPlayMeanIn: number; serviceMonths: number };
};

describe("case life", () => {
  let id = "";
  let number = "";
  let version = 0;

  test("an inspector files a field report; the field call and service time are computed", async () => {
    const inspector = await as("inspector");
    const res = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    expect(res.status).toBe(201);
    ({ id, number, version } = res.body.case);
    expect(number).toMatch(/^TL-26-\d{5}$/);
    expect(res.body.case.status).toBe("field");
    // Rough felt on a valid hand roll removes (common practice).
    expect(res.body.case.fieldCall).toBe("remove");
    // Mean of 0.020 and 0.021 in (arithmetic).
    expect(res.body.case.endPlayMeanIn).toBeCloseTo(0.0205, 5);
    // 2020-04-20 to 2026-10-20: 2374 days / 30.436875 (mean Gregorian month, arithmetic) = 78.0 months.
    expect(res.body.case.serviceMonths).toBeCloseTo(78.0, 1);
  });

  test("the analyst cannot add findings before receiving; receiving moves it to the bench", async () => {
    const analyst = await as("analyst");
    const early = await analyst.json("POST", `/api/cases/${id}/findings`, {
      version,
      finding: { component: "cup", damageCode: "fatigue.subsurface", severity: 3 },
    });
    expect(early.status).toBe(403);
    const r = await analyst.json<CaseBody>("POST", `/api/cases/${id}/transitions`, { version, action: "receive" });
    expect(r.status).toBe(200);
    expect(r.body.case.status).toBe("bench");
    version = r.body.case.version;
  });

  test("a verdict cannot go for sign-off while incomplete", async () => {
    const analyst = await as("analyst");
    const r = await analyst.json<{ error: string }>("POST", `/api/cases/${id}/transitions`, { version, action: "propose" });
    expect(r.status).toBe(400);
    expect(r.body.error).toMatch(/primary root cause/);
  });

  test("the analyst records findings, teardown and verdict, then proposes; engineers are e-mailed", async () => {
    const analyst = await as("analyst");
    const f = await analyst.json<{ version: number }>("POST", `/api/cases/${id}/findings`, {
      version,
      finding: {
        component: "cup",
        row: "outboard",
        damageCode: "fatigue.subsurface",
        severity: 3,
        clockDeg: 350,
        arcDeg: 30,
        zone: "raceway",
        lengthMm: 18,
        widthMm: 9,
        notes: "Spall at the load zone.",
      },
    });
    expect(f.status).toBe(201);
    version = f.body.version;
    const td = await analyst.json<CaseBody>("PATCH", `/api/cases/${id}`, {
      version,
      section: "teardown",
      data: {
        lubricant: { conditions: ["normal"] },
        dispositions: { cup: "scrap" },
        teardownNotes: "Outboard cup raceway spalled at 12 o'clock.",
      },
    });
    expect(td.status).toBe(200);
    version = td.body.case.version;
    const v = await analyst.json<CaseBody>("PATCH", `/api/cases/${id}`, {
      version,
      section: "verdict",
      data: {
        primaryCause: "end-of-life",
        contributingCauses: [],
        confidence: "confirmed",
        removalConfirmed: "confirmed",
        correctiveAction: "None; normal life.",
      },
    });
    expect(v.status).toBe(200);
    version = v.body.case.version;
    const p = await analyst.json<CaseBody>("POST", `/api/cases/${id}/transitions`, { version, action: "propose" });
    expect(p.status).toBe(200);
    expect(p.body.case.status).toBe("signoff");
    version = p.body.case.version;
    const mail = await waitForMail((m) => m.to.includes(demoUser("engineer").email) && m.subject.includes(number));
    expect(mail.text).toContain(`/cases/${number}`);
  });

  test("only engineers sign; a return needs a reason and e-mails the analyst and the inspector", async () => {
    const analyst = await as("analyst");
    expect((await signVerdict(analyst, id)).status).toBe(403);
    // never on one click: the plain step is refused and points to the signature step
    const oneClick = await (
      await as("engineer")
    ).json<{ error: string }>("POST", `/api/cases/${id}/transitions`, { version, action: "sign" });
    expect(oneClick.status).toBe(400);
    expect(oneClick.body.error).toMatch(/asks for your password/);
    const engineer = await as("engineer");
    const noReason = await engineer.json("POST", `/api/cases/${id}/transitions`, { version, action: "return" });
    expect(noReason.status).toBe(400);
    const ret = await engineer.json<CaseBody>("POST", `/api/cases/${id}/transitions`, {
      version,
      action: "return",
      reason: "Photograph the cone raceways too, please.",
    });
    expect(ret.status).toBe(200);
    expect(ret.body.case.status).toBe("bench");
    version = ret.body.case.version;
    const mail = await waitForMail(
      (m) => m.subject.includes(number) && m.to.includes(demoUser("analyst").email) && m.text.includes("Photograph the cone raceways"),
    );
    expect(mail.to).toContain(demoUser("inspector").email);
  });

  test("after re-proposal the engineer signs; the signed case is read-only; reopening needs a reason", async () => {
    const analyst = await as("analyst");
    const p = await analyst.json<CaseBody>("POST", `/api/cases/${id}/transitions`, { version, action: "propose" });
    version = p.body.case.version;
    const engineer = await as("engineer");
    const s = await signVerdict<CaseBody>(engineer, id, { version });
    expect(s.status).toBe(200);
    expect(s.body.case.status).toBe("signed");
    version = s.body.case.version;
    await waitForMail((m) => m.subject.includes(number) && /signed/i.test(m.subject) && m.to.includes(demoUser("analyst").email));

    const admin = await as("admin");
    const edit = await admin.json<{ error: string }>("PATCH", `/api/cases/${id}`, {
      version,
      section: "verdict",
      data: { correctiveAction: "changed" },
    });
    expect(edit.status).toBe(409);
    expect(edit.body.error).toMatch(/signed and read-only/);
    const [row] = await db.select().from(t.cases).where(eq(t.cases.id, id));
    expect(row.correctiveAction).toBe("None; normal life.");

    expect((await engineer.json("POST", `/api/cases/${id}/transitions`, { version, action: "reopen" })).status).toBe(400);
    const re = await engineer.json<CaseBody>("POST", `/api/cases/${id}/transitions`, {
      version,
      action: "reopen",
      reason: "Maker asked for a second look at the cone.",
    });
    expect(re.status).toBe(200);
    expect(re.body.case.status).toBe("bench");
  });

  test("the history lists every step with who and what changed", async () => {
    const manager = await as("manager");
    const h = await manager.json<{
      events: { action: string; userName: string; reason: string | null; changes: { field: string; from: unknown; to: unknown }[] }[];
    }>("GET", `/api/cases/${id}/history`);
    expect(h.status).toBe(200);
    const actions = h.body.events.map((e) => e.action).reverse();
    expect(actions).toEqual([
      "created",
      "receive",
      "finding-added",
      "teardown-saved",
      "verdict-saved",
      "propose",
      "return",
      "propose",
      "sign",
      "reopen",
    ]);
    const reopen = h.body.events[0];
    expect(reopen.userName).toBe(demoUser("engineer").name);
    expect(reopen.reason).toMatch(/second look/);
    const sign = h.body.events.find((e) => e.action === "sign")!;
    expect(sign.changes.find((c) => c.field === "status")).toEqual({ field: "status", from: "signoff", to: "signed" });
  });

  test("anonymous callers get 401 on every case route", async () => {
    const anon = new ApiClient();
    for (const [m, p] of [
      ["GET", `/api/cases/${id}`],
      ["PATCH", `/api/cases/${id}`],
      ["POST", `/api/cases/${id}/transitions`],
      ["GET", `/api/cases/${id}/history`],
      ["POST", "/api/cases"],
    ]) {
      expect((await anon.request(m, p, m === "GET" ? undefined : {})).status, `${m} ${p}`).toBe(401);
    }
  });
});
