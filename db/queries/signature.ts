// What a signature covers, read from the database, and the signer's stored password hash.
import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { account, findings, photos } from "@/db/schema";
import type { SignedFinding } from "@/lib/cases/signature-content";

export async function signedParts(caseId: string): Promise<{ findings: SignedFinding[]; photoHashes: string[] }> {
  const [f, p] = await Promise.all([
    db
      .select({
        component: findings.component,
        row: findings.row,
        zone: findings.zone,
        damageCode: findings.damageCode,
        severity: findings.severity,
        clockDeg: findings.clockDeg,
        arcDeg: findings.arcDeg,
        lengthMm: findings.lengthMm,
        widthMm: findings.widthMm,
        notes: findings.notes,
      })
      .from(findings)
      .where(eq(findings.caseId, caseId))
      .orderBy(asc(findings.createdAt)),
    db.select({ sha256: photos.sha256 }).from(photos).where(eq(photos.caseId, caseId)),
  ]);
  return { findings: f, photoHashes: p.map((x) => x.sha256) };
}

export async function passwordHashOf(userId: string): Promise<string | null> {
  const [row] = await db
    .select({ password: account.password })
    .from(account)
    .where(and(eq(account.userId, userId), eq(account.providerId, "credential")));
  return row?.password ?? null;
}
