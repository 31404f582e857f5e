// A complete field report as an inspector at Marrow Junction would file it.
import { siteId } from "../../support/factories";

export async function fieldReport(overrides: Record<string, unknown> = {}) {
  return {
    siteId: await siteId("MJC"),
    removedOn: "2026-10-20",
    carMark: "CWTX",
    carNumber: String(200000 + Math.floor(Math.random() * 99999)),
    axle: 2,
    side: "R",
    wheelDiameterIn: 36,
    trigger: "hand-roll",
    triggerDetail: { felt: "roughness" },
    serial: `CW${Math.floor(Math.random() * 1e8)}`,
    bearingClass: "F",
    makerCode: "MK-T",
    mountedOn: "2020-04-20",
    serviceMiles: 420000,
    fieldChecks: {
      handRoll: {
        grid: {
          "0": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
          "120": { pull: { feel: "rough", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
          "240": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
        },
        procedure: { turnedBy: "hand", oneDirection: true, judgedBy: "feel" },
      },
      endPlay: {
        method: "dial",
        unit: "in",
        trials: [
          { zero: "0", reading: "0.020" },
          { zero: "0", reading: "0.021" },
        ],
      },
      visual: [],
      confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true },
    },
    fieldNotes: "Rough at 120 degrees pulled, felt twice.",
    ...overrides,
  };
}

type Stepper = { json<T>(method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> };
type CaseAnswer = { case?: { id: string; number: string; version: number; status: string }; version?: number; error?: string };

/** Files a case as `filer`, then receives, records a finding, writes a verdict and proposes it as `lab`. */
export async function caseAwaitingSignoff(filer: Stepper, lab: Stepper, overrides: Record<string, unknown> = {}) {
  const filed = await filer.json<CaseAnswer>("POST", "/api/cases", await fieldReport(overrides));
  if (filed.status !== 201) throw new Error(`filing failed: ${filed.status} ${JSON.stringify(filed.body)}`);
  const { id, number } = filed.body.case!;
  let version = filed.body.case!.version;
  const step = async (method: string, path: string, body: Record<string, unknown>) => {
    const r = await lab.json<CaseAnswer>(method, path, { version, ...body });
    if (r.status >= 300) throw new Error(`${method} ${path} failed: ${r.status} ${JSON.stringify(r.body)}`);
    version = r.body.case?.version ?? r.body.version!;
  };
  await step("POST", `/api/cases/${id}/transitions`, { action: "receive" });
  await step("POST", `/api/cases/${id}/findings`, {
    finding: { component: "cup", row: "outboard", damageCode: "fatigue.subsurface", severity: 2, zone: "raceway" },
  });
  await step("PATCH", `/api/cases/${id}`, {
    section: "verdict",
    data: {
      primaryCause: "end-of-life",
      contributingCauses: [],
      confidence: "probable",
      removalConfirmed: "confirmed",
      correctiveAction: "None.",
    },
  });
  await step("POST", `/api/cases/${id}/transitions`, { action: "propose" });
  return { id, number, version };
}
