// The signature ceremony over HTTP: the password again, the meaning confirmed, a hash of what was
// shown; the stored hash checks whether the case still holds what was signed.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, test } from "vitest";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { signVerdict, type SignatureView } from "../../support/sign";
import { fieldReport } from "./fixtures";

type CaseBody = { case: { id: string; version: number; status: string; signedContentHash?: string } };
let id = "";
let version = 0;

beforeAll(async () => {
  const admin = await as("admin");
  const filed = await (await as("inspector")).json<CaseBody>("POST", "/api/cases", await fieldReport());
  id = filed.body.case.id;
  version = filed.body.case.version;
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
  await step({
    finding: { component: "cup", row: "outboard", damageCode: "fatigue.subsurface", severity: 3, zone: "raceway", notes: "Load zone." },
  });
  await step({
    section: "verdict",
    data: {
      primaryCause: "end-of-life",
      contributingCauses: [],
      confidence: "confirmed",
      removalConfirmed: "confirmed",
      correctiveAction: "None.",
    },
  });
  await step({ action: "propose" });
});

describe("signing a verdict", () => {
  test("shows what is signed and what the signature means before anything is signed", async () => {
    const view = await (
      await as("engineer")
    ).json<SignatureView & { content: { findings: unknown[]; photoHashes: unknown[] } }>("GET", `/api/cases/${id}/signature`);
    expect(view.status).toBe(200);
    expect(view.body.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(view.body.meaning).toMatch(/I confirm this root-cause verdict/);
    expect(view.body.content.findings).toHaveLength(1);
    expect(view.body.signature).toBeNull();
  });

  test("refuses a wrong password, an unticked meaning and content that changed, and signs nothing", async () => {
    const engineer = await as("engineer");
    const wrong = await signVerdict(engineer, id, { password: "not-the-password-1" });
    expect(wrong.status).toBe(403);
    expect(wrong.body.error).toMatch(/password is not right/);
    const view = await engineer.json<SignatureView>("GET", `/api/cases/${id}/signature`);
    const unticked = await engineer.json("POST", `/api/cases/${id}/signature`, {
      version,
      password: "x",
      contentHash: view.body.contentHash,
      meaningAccepted: false,
    });
    expect(unticked.status).toBe(400);
    const { DEMO_PASSWORD } = await import("../../../scripts/seed/demo-people");
    const stale = await engineer.json<{ error: string }>("POST", `/api/cases/${id}/signature`, {
      version,
      password: DEMO_PASSWORD,
      contentHash: "0".repeat(64),
      meaningAccepted: true,
    });
    expect(stale.status).toBe(409);
    const [row] = await db.select().from(t.cases).where(eq(t.cases.id, id));
    expect(row.status).toBe("signoff");
    expect(row.signedContentHash).toBeNull();
  });

  test("the right password signs; the stored hash is the one shown, and the check notices a later change", async () => {
    const engineer = await as("engineer");
    const shown = (await engineer.json<SignatureView>("GET", `/api/cases/${id}/signature`)).body.contentHash;
    const signed = await signVerdict<CaseBody>(engineer, id);
    expect(signed.status, JSON.stringify(signed.body)).toBe(200);
    expect(signed.body.case.status).toBe("signed");
    expect(signed.body.case.signedContentHash).toBe(shown);
    const after = await engineer.json<SignatureView>("GET", `/api/cases/${id}/signature`);
    expect(after.body.signature).toMatchObject({ hash: shown, matches: true });
    expect(after.body.signature!.meaning).toMatch(/I confirm/);

    // someone edits a finding behind the application's back: the check says so
    await db.update(t.findings).set({ notes: "Edited later." }).where(eq(t.findings.caseId, id));
    const tampered = await engineer.json<SignatureView>("GET", `/api/cases/${id}/signature`);
    expect(tampered.body.signature).toMatchObject({ hash: shown, matches: false });
    await db.update(t.findings).set({ notes: "Load zone." }).where(eq(t.findings.caseId, id));
    expect((await engineer.json<SignatureView>("GET", `/api/cases/${id}/signature`)).body.signature!.matches).toBe(true);
  });

  test("an anonymous caller gets 401 and an analyst cannot sign", async () => {
    const { ApiClient } = await import("../../support/api");
    expect((await new ApiClient().request("POST", `/api/cases/${id}/signature`, {})).status).toBe(401);
    expect((await signVerdict(await as("analyst"), id)).status).toBe(403);
  });
});
