// Related cases: an engineer links two cases; the link is stored both ways in one
// transaction so each case lists the other, and both histories record it.
import "server-only";
import { and, asc, desc, eq, inArray, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db, type Tx } from "@/db";
import { caseEvents, caseLinks, cases, codeEntries, user } from "@/db/schema";
import type { Stage } from "@/lib/cases/stages";
import { RowMissing, WriteRefused } from "@/db/refusals";
import { readableCases, type CaseViewer } from "./case-scope";

export interface CaseLinkItem {
  readonly id: string;
  readonly number: string;
  readonly status: Stage;
  readonly triggerLabel: string;
  readonly causeLabel: string | null;
  readonly removedOn: string | null;
  readonly note: string;
  readonly linkedBy: string | null;
  readonly linkedAt: string;
}

const related = alias(cases, "related");
const triggerCode = alias(codeEntries, "trigger_code");
const causeCode = alias(codeEntries, "cause_code");

/** Linked cases the viewer may read, newest link first. */
export async function listCaseLinks(caseId: string, viewer: CaseViewer): Promise<CaseLinkItem[]> {
  const scope = readableCases(viewer, { createdBy: related.createdBy, siteId: related.siteId });
  const rows = await db
    .select({
      id: related.id,
      number: related.number,
      status: related.status,
      triggerLabel: sql<string>`coalesce(${triggerCode.label}, ${related.trigger})`,
      causeLabel: sql<string | null>`coalesce(${causeCode.label}, ${related.primaryCause})`,
      removedOn: related.removedOn,
      note: caseLinks.note,
      linkedBy: user.name,
      linkedAt: caseLinks.createdAt,
    })
    .from(caseLinks)
    .innerJoin(related, eq(related.id, caseLinks.relatedId))
    .leftJoin(triggerCode, and(eq(triggerCode.list, "trigger"), eq(triggerCode.code, related.trigger)))
    .leftJoin(causeCode, and(eq(causeCode.list, "cause"), eq(causeCode.code, related.primaryCause)))
    .leftJoin(user, eq(user.id, caseLinks.createdBy))
    .where(and(eq(caseLinks.caseId, caseId), scope))
    .orderBy(desc(caseLinks.createdAt));
  return rows.map((r) => ({ ...r, linkedAt: r.linkedAt.toISOString() }));
}

type Actor = { id: string };
type CaseRef = { id: string; number: string };

const isUniqueViolation = (e: unknown) => {
  const cause = (e as { cause?: { code?: string } })?.cause ?? (e as { code?: string });
  return cause?.code === "23505";
};

/** Locks both cases (in id order, so two linkers never deadlock), refuses a signed one and moves
 * both versions: a link is evidence, and a sign-off over a case whose links moved is refused as stale. */
async function touchBothOpen(tx: Tx, a: CaseRef, b: CaseRef, actor: Actor) {
  const rows = await tx
    .select({ id: cases.id, number: cases.number, status: cases.status })
    .from(cases)
    .where(inArray(cases.id, [a.id, b.id]))
    .orderBy(asc(cases.id))
    .for("update");
  const signed = rows.find((r) => r.status === "signed");
  if (signed)
    throw new WriteRefused(
      `${signed.number} is signed and read-only, so its links cannot change. An engineer can reopen it with a reason.`,
    );
  await tx
    .update(cases)
    .set({ version: sql`${cases.version} + 1`, updatedBy: actor.id, updatedAt: new Date() })
    .where(inArray(cases.id, [a.id, b.id]));
}

export async function addCaseLink(a: CaseRef, b: CaseRef, note: string, actor: Actor): Promise<void> {
  try {
    await db.transaction(async (tx) => {
      const existing = await tx
        .select({ n: sql<number>`1` })
        .from(caseLinks)
        .where(and(eq(caseLinks.caseId, a.id), eq(caseLinks.relatedId, b.id)));
      if (existing.length) throw new WriteRefused(`${a.number} and ${b.number} are already linked.`);
      await touchBothOpen(tx, a, b, actor);
      await tx.insert(caseLinks).values([
        { caseId: a.id, relatedId: b.id, note, createdBy: actor.id },
        { caseId: b.id, relatedId: a.id, note, createdBy: actor.id },
      ]);
      await tx.insert(caseEvents).values([
        {
          caseId: a.id,
          userId: actor.id,
          action: "linked",
          changes: [{ field: "related", from: null, to: b.number }],
          reason: note || null,
        },
        {
          caseId: b.id,
          userId: actor.id,
          action: "linked",
          changes: [{ field: "related", from: null, to: a.number }],
          reason: note || null,
        },
      ]);
    });
  } catch (e) {
    // Two people linking the same pair at once: the unique index lets only one through.
    if (isUniqueViolation(e)) throw new WriteRefused(`${a.number} and ${b.number} are already linked.`);
    throw e;
  }
}

export async function removeCaseLink(a: CaseRef, b: CaseRef, actor: Actor): Promise<void> {
  await db.transaction(async (tx) => {
    const removed = await tx
      .delete(caseLinks)
      .where(
        or(and(eq(caseLinks.caseId, a.id), eq(caseLinks.relatedId, b.id)), and(eq(caseLinks.caseId, b.id), eq(caseLinks.relatedId, a.id))),
      )
      .returning({ caseId: caseLinks.caseId });
    if (removed.length === 0) throw new RowMissing(`A link between ${a.number} and ${b.number}`);
    await touchBothOpen(tx, a, b, actor);
    await tx.insert(caseEvents).values([
      { caseId: a.id, userId: actor.id, action: "unlinked", changes: [{ field: "related", from: b.number, to: null }] },
      { caseId: b.id, userId: actor.id, action: "unlinked", changes: [{ field: "related", from: a.number, to: null }] },
    ]);
  });
}
