// A signed verdict needs a second person: whoever proposed it (an admin may do both steps) cannot sign.
import { describe, expect, test } from "vitest";
import { as } from "../../support/api";
import { signVerdict } from "../../support/sign";
import { fieldReport } from "./fixtures";

type CaseBody = { case: { id: string; version: number; status: string } };

describe("separation of duties at sign-off", () => {
  test("the admin who proposed is refused with a message naming who can sign; an engineer then signs", async () => {
    const inspector = await as("inspector");
    const admin = await as("admin");
    const filed = await inspector.json<CaseBody>("POST", "/api/cases", await fieldReport());
    expect(filed.status).toBe(201);
    const id = filed.body.case.id;
    let version = filed.body.case.version;
    const step = async (body: Record<string, unknown>) => {
      const r = await admin.json<CaseBody & { version?: number }>(
        body.finding ? "POST" : body.section ? "PATCH" : "POST",
        body.finding ? `/api/cases/${id}/findings` : body.section ? `/api/cases/${id}` : `/api/cases/${id}/transitions`,
        { version, ...body },
      );
      expect(r.status, JSON.stringify(r.body)).toBeLessThan(300);
      version = r.body.case?.version ?? r.body.version!;
    };
    await step({ action: "receive" });
    await step({ finding: { component: "cup", row: "outboard", damageCode: "fatigue.subsurface", severity: 2, zone: "raceway" } });
    await step({
      section: "verdict",
      data: {
        primaryCause: "end-of-life",
        contributingCauses: [],
        confidence: "probable",
        removalConfirmed: "confirmed",
        correctiveAction: "None.",
      },
    });
    await step({ action: "propose" });

    const own = await signVerdict(admin, id, { version });
    expect(own.status).toBe(403);
    expect(own.body.error).toMatch(/another engineer or an admin must sign/);

    const engineer = await as("engineer");
    const signed = await signVerdict<CaseBody>(engineer, id, { version });
    expect(signed.status).toBe(200);
    expect(signed.body.case.status).toBe("signed");
  });
});
