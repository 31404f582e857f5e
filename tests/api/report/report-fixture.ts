// A signed and a draft case with findings, photos (objects really stored) and a related case.
import { createHash, randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { putObject } from "@/lib/storage/s3";
import { createCase, userId } from "../../support/factories";
import { db, t } from "../../support/db";

export const sha256 = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");

const FIELD_CHECKS = {
  handRoll: {
    grid: {
      "0": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "rough", revolutions: 2 } },
      "120": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
      "240": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
    },
    procedure: { turnedBy: "hand", oneDirection: true, judgedBy: "feel" },
  },
  endPlay: {
    method: "dial",
    unit: "in",
    trials: [
      { zero: "0.000", reading: "0.020" },
      { zero: "0.000", reading: "0.021" },
      { zero: "0.000", reading: "0.019" },
    ],
  },
  visual: [],
  confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true, cooled: true },
};

export async function addPhoto(
  caseId: string,
  p: { component: string; findingId?: string; fileName: string; rgb: [number, number, number] },
) {
  const [r, g, b] = p.rgb;
  const original = await sharp({ create: { width: 640, height: 480, channels: 3, background: { r, g, b } } })
    .jpeg({ quality: 90 })
    .toBuffer();
  const digest = sha256(original);
  const folder = `cases/${caseId}/${digest}/`;
  await putObject(`${folder}original`, original, "image/jpeg");
  await putObject(`${folder}screen.webp`, await sharp(original).webp().toBuffer(), "image/webp");
  await putObject(`${folder}thumb.webp`, await sharp(original).resize(320).webp().toBuffer(), "image/webp");
  await db.insert(t.photos).values({
    id: randomUUID(),
    caseId,
    component: p.component,
    findingId: p.findingId ?? null,
    caption: "",
    sha256: digest,
    contentType: "image/jpeg",
    bytes: original.length,
    width: 640,
    height: 480,
    originalKey: `${folder}original`,
    screenKey: `${folder}screen.webp`,
    thumbKey: `${folder}thumb.webp`,
    fileName: p.fileName,
  });
  return { original, digest };
}

export async function reportCases() {
  const [engineer, analyst] = [await userId("engineer"), await userId("analyst")];
  const verdict = {
    primaryCause: "water-ingress",
    contributingCauses: ["seal"],
    confidence: "confirmed" as const,
    removalConfirmed: "confirmed" as const,
    proposedBy: analyst,
    proposedAt: new Date("2026-06-20T10:00:00Z"),
    correctiveAction: "Check seal seating on the wheel line.",
  };
  const related = await createCase({ status: "signed", primaryCause: "water-ingress" });
  const signed = await createCase({
    status: "signed",
    fieldChecks: FIELD_CHECKS,
    fieldCall: "remove",
    ...verdict,
    signedBy: engineer,
    signedAt: new Date("2026-06-22T09:30:00Z"),
    findings: [
      {
        component: "cup",
        row: "inboard",
        damageCode: "corrosion.moisture",
        severity: 3,
        clockDeg: 0,
        arcDeg: 40,
        zone: "raceway",
        lengthMm: 22,
        widthMm: 9,
        notes: "Etch at roller spacing.",
      },
      { component: "seal-inboard", damageCode: "seal.damaged", severity: 3, notes: "Lip torn." },
    ],
  });
  const draft = await createCase({
    status: "bench",
    fieldChecks: FIELD_CHECKS,
    findings: [{ component: "cone-outboard", damageCode: "fatigue.surface", severity: 2, clockDeg: 90 }],
  });
  const found = await db.select().from(t.findings).where(eq(t.findings.caseId, signed.id));
  const cupFinding = found.find((f) => f.component === "cup")!;
  const photos = [
    await addPhoto(signed.id, { component: "cup", findingId: cupFinding.id, fileName: "cup raceway 12.jpg", rgb: [120, 90, 60] }),
    await addPhoto(signed.id, { component: "seal-inboard", fileName: "seal.jpg", rgb: [40, 60, 90] }),
  ];
  await db.insert(t.caseLinks).values([
    { caseId: signed.id, relatedId: related.id, note: "Same car, other axle" },
    { caseId: related.id, relatedId: signed.id, note: "Same car, other axle" },
  ]);
  return { signed, draft, related, photos };
}
