// Writing a case: create, section saves with a version check, findings, and workflow steps.
// Every write records who changed what in case_events inside the same transaction.
import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db, type Tx } from "@/db";
import { caseEvents, cases, findings, type Case, type FieldChange } from "@/db/schema";
import { diffFields } from "@/lib/cases/diff";
import { RowMissing, WriteRefused } from "@/db/refusals";
import { nextCaseNumber } from "./case-number";

type Actor = { id: string; name: string };
type CaseValues = Partial<typeof cases.$inferInsert>;

async function record(tx: Tx, caseId: string, userId: string, action: string, changes: FieldChange[], reason?: string) {
  await tx.insert(caseEvents).values({ caseId, userId, action, changes, reason: reason ?? null });
}

export async function insertCase(values: CaseValues, actor: Actor): Promise<Case> {
  return db.transaction(async (tx) => {
    const year = Number((values.removedOn ?? new Date().toISOString()).slice(0, 4));
    const number = await nextCaseNumber(tx, year);
    const [row] = await tx
      .insert(cases)
      .values({ ...values, number, status: "field", createdBy: actor.id, updatedBy: actor.id })
      .returning();
    const changes = diffFields({}, values as Record<string, unknown>).filter((c) => c.to !== null && c.to !== "");
    await record(tx, row.id, actor.id, "created", changes);
    return row;
  });
}

function isCreateKeyClash(e: unknown): boolean {
  const cause = ((e as { cause?: unknown })?.cause ?? e) as { code?: string; constraint?: string };
  return cause?.code === "23505" && cause.constraint === "cases_create_key_idx";
}

const findByCreateKey = async (userId: string, key: string) =>
  (
    await db
      .select()
      .from(cases)
      .where(and(eq(cases.createdBy, userId), eq(cases.createKey, key)))
      .limit(1)
  )[0];

/**
 * Files a case at most once per (person, key). The unique index in PostgreSQL is the judge, so a replay
 * or a double tap landing on another app server at the same moment still finds the first case.
 */
export async function insertCaseOnce(values: CaseValues, actor: Actor, key: string): Promise<{ row: Case; replayed: boolean }> {
  const earlier = await findByCreateKey(actor.id, key);
  if (earlier) return { row: earlier, replayed: true };
  try {
    return { row: await insertCase({ ...values, createKey: key }, actor), replayed: false };
  } catch (e) {
    if (!isCreateKeyClash(e)) throw e;
    const winner = await findByCreateKey(actor.id, key);
    if (!winner) throw e;
    return { row: winner, replayed: true };
  }
}

/** Locks the case and refuses when someone saved since `version`: the second save never overwrites. */
async function lockAtVersion(tx: Tx, caseId: string, version: number, attempted: string[]) {
  const [current] = await tx.select().from(cases).where(eq(cases.id, caseId)).for("update");
  if (!current) throw new RowMissing("That case");
  if (current.version !== version) {
    // A case imported or seeded without an editor has no updatedBy; the refusal must still be a 409.
    const [who] = (await tx.execute(sql`select name from "user" where id = ${current.updatedBy}`)).rows as { name: string }[];
    const name = who?.name ?? null;
    const theirs = Object.fromEntries(attempted.map((k) => [k, (current as Record<string, unknown>)[k]]));
    throw new WriteRefused(
      `${name ?? "Someone"} saved this case at ${current.updatedAt.toISOString().slice(11, 16)} UTC while you were editing. Your changes were not saved; reload to see theirs, then apply yours again.`,
      { currentVersion: current.version, updatedBy: name, updatedAt: current.updatedAt, current: theirs },
    );
  }
  return current;
}

/** `alsoInTx` runs in the same transaction after the row is written (the step's notice is queued there). */
export async function updateCase(
  caseId: string,
  version: number,
  patch: CaseValues,
  actor: Actor,
  action: string,
  reason?: string,
  alsoInTx?: (tx: Tx, row: Case) => Promise<void>,
) {
  return db.transaction(async (tx) => {
    const current = await lockAtVersion(tx, caseId, version, Object.keys(patch));
    const changes = diffFields(current as Record<string, unknown>, patch as Record<string, unknown>);
    if (changes.length === 0 && !reason) return current;
    const [row] = await tx
      .update(cases)
      .set({ ...patch, version: current.version + 1, updatedBy: actor.id, updatedAt: new Date() })
      .where(and(eq(cases.id, caseId), eq(cases.version, version)))
      .returning();
    await record(tx, caseId, actor.id, action, changes, reason);
    if (alsoInTx) await alsoInTx(tx, row);
    return row;
  });
}

type FindingValues = Omit<typeof findings.$inferInsert, "caseId" | "id">;

export async function addFinding(caseId: string, version: number, values: FindingValues, actor: Actor) {
  return db.transaction(async (tx) => {
    const current = await lockAtVersion(tx, caseId, version, []);
    const [f] = await tx
      .insert(findings)
      .values({ ...values, caseId, createdBy: actor.id })
      .returning();
    await tx
      .update(cases)
      .set({ version: current.version + 1, updatedBy: actor.id, updatedAt: new Date() })
      .where(eq(cases.id, caseId));
    await record(tx, caseId, actor.id, "finding-added", [
      { field: `finding ${values.component}`, from: null, to: `${values.damageCode} (severity ${values.severity})` },
    ]);
    return { finding: f, version: current.version + 1 };
  });
}

export async function changeFinding(
  caseId: string,
  findingId: string,
  version: number,
  values: Partial<FindingValues> | null,
  actor: Actor,
) {
  return db.transaction(async (tx) => {
    const current = await lockAtVersion(tx, caseId, version, []);
    const [before] = await tx
      .select()
      .from(findings)
      .where(and(eq(findings.id, findingId), eq(findings.caseId, caseId)));
    if (!before) throw new RowMissing("That finding");
    let changes: FieldChange[];
    let after = null;
    if (values === null) {
      await tx.delete(findings).where(eq(findings.id, findingId));
      changes = [{ field: `finding ${before.component}`, from: `${before.damageCode} (severity ${before.severity})`, to: null }];
    } else {
      [after] = await tx.update(findings).set(values).where(eq(findings.id, findingId)).returning();
      changes = diffFields(before as Record<string, unknown>, values as Record<string, unknown>).map((c) => ({
        ...c,
        field: `finding ${before.component}: ${c.field}`,
      }));
    }
    await tx
      .update(cases)
      .set({ version: current.version + 1, updatedBy: actor.id, updatedAt: new Date() })
      .where(eq(cases.id, caseId));
    await record(tx, caseId, actor.id, values === null ? "finding-removed" : "finding-changed", changes);
    return { finding: after, version: current.version + 1 };
  });
}

export async function countFindings(caseId: string): Promise<number> {
  const [{ n }] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(findings)
    .where(eq(findings.caseId, caseId));
  return n;
}

/** The damage code a finding of this case has now, or null when there is no such finding. */
export async function findingCode(caseId: string, findingId: string): Promise<string | null> {
  const [f] = await db
    .select({ code: findings.damageCode })
    .from(findings)
    .where(and(eq(findings.id, findingId), eq(findings.caseId, caseId)));
  return f?.code ?? null;
}

/** The case, if its latest change is `action` by `userId` taken at `fromVersion` (so it now stands one above). */
export async function stepAlreadyTaken(caseId: string, fromVersion: number, action: string, userId: string): Promise<Case | null> {
  const [row] = await db
    .select()
    .from(cases)
    .where(and(eq(cases.id, caseId), eq(cases.version, fromVersion + 1)));
  if (!row) return null;
  const [last] = await db
    .select({ action: caseEvents.action, userId: caseEvents.userId })
    .from(caseEvents)
    .where(eq(caseEvents.caseId, caseId))
    .orderBy(sql`${caseEvents.at} desc, ${caseEvents.id} desc`)
    .limit(1);
  return last && last.action === action && last.userId === userId ? row : null;
}
