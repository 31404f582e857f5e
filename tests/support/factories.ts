// Builds cases and findings straight in the database for tests that need a known casebook.
import { eq } from "drizzle-orm";
import { nextCaseNumber } from "../../db/queries/case-number";
import { db, t } from "./db";
import { demoUser, type DemoRole } from "./api";

export async function userId(role: DemoRole): Promise<string> {
  const [u] = await db
    .select({ id: t.user.id })
    .from(t.user)
    .where(eq(t.user.email, demoUser(role).email));
  return u.id;
}

export async function siteId(code: string): Promise<string> {
  const [s] = await db.select({ id: t.sites.id }).from(t.sites).where(eq(t.sites.code, code));
  return s.id;
}

type CaseInput = Partial<typeof t.cases.$inferInsert> & { findings?: Array<Partial<typeof t.findings.$inferInsert>> };

export async function createCase(input: CaseInput = {}) {
  const { findings = [], ...values } = input;
  const removedOn = values.removedOn ?? "2026-06-15";
  const number = await nextCaseNumber(db, Number(removedOn.slice(0, 4)));
  const [row] = await db
    .insert(t.cases)
    .values({
      number,
      serial: `TST${Math.floor(Math.random() * 1e7)
        .toString()
        .padStart(7, "0")}`,
      bearingClass: "F",
      carMark: "TSTX",
      carNumber: String(100000 + Math.floor(Math.random() * 899999)),
      axle: 1,
      side: "L",
      removedOn,
      trigger: "hand-roll",
      siteId: values.siteId ?? (await siteId("MJC")),
      createdBy: values.createdBy ?? (await userId("inspector")),
      ...values,
    })
    .returning();
  if (findings.length) {
    await db
      .insert(t.findings)
      .values(findings.map((f) => ({ caseId: row.id, component: "cup", damageCode: "fatigue.subsurface", severity: 3, ...f })));
  }
  return row;
}
