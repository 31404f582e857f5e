// Reading one case with everything the case page shows, and resolving a case by id or number,
// always within what the viewer may read.
import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { db } from "@/db";
import { caseEvents, cases, findings, sites, user } from "@/db/schema";
import { readableCases, type CaseViewer } from "./case-scope";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const NUMBER = /^TL-\d{2}-\d{5,}$/;

export function caseKey(key: string) {
  if (UUID.test(key)) return eq(cases.id, key);
  if (NUMBER.test(key.toUpperCase())) return eq(cases.number, key.toUpperCase());
  return null;
}

/** One case by id or number, only if the viewer may read it: one query, no check afterwards. */
export async function findReadableCase(key: string, viewer: CaseViewer) {
  const where = caseKey(key);
  if (!where) return null;
  const [row] = await db
    .select()
    .from(cases)
    .where(and(where, readableCases(viewer)));
  return row ?? null;
}

const removalSite = alias(sites, "removal_site");
const labSite = alias(sites, "lab_site");
const creator = alias(user, "creator");
const proposer = alias(user, "proposer");
const signer = alias(user, "signer");
const updater = alias(user, "updater");

export async function getCaseDetail(key: string, viewer: CaseViewer) {
  const where = caseKey(key);
  if (!where) return null;
  const [row] = await db
    .select({
      c: cases,
      siteName: removalSite.name,
      sitePolicy: {
        endPlayMaxIn: removalSite.endPlayMaxIn,
        dialSpreadIn: removalSite.dialSpreadIn,
        tapeSpreadIn: removalSite.tapeSpreadIn,
        plausibleMaxIn: removalSite.plausibleMaxIn,
      },
      labName: labSite.name,
      createdByName: creator.name,
      proposedByName: proposer.name,
      signedByName: signer.name,
      updatedByName: updater.name,
    })
    .from(cases)
    .leftJoin(removalSite, eq(removalSite.id, cases.siteId))
    .leftJoin(labSite, eq(labSite.id, cases.labSiteId))
    .leftJoin(creator, eq(creator.id, cases.createdBy))
    .leftJoin(proposer, eq(proposer.id, cases.proposedBy))
    .leftJoin(signer, eq(signer.id, cases.signedBy))
    .leftJoin(updater, eq(updater.id, cases.updatedBy))
    .where(and(where, readableCases(viewer)));
  if (!row) return null;
  const caseFindings = await db.select().from(findings).where(eq(findings.caseId, row.c.id)).orderBy(asc(findings.createdAt));
  return {
    ...row.c,
    siteName: row.siteName,
    labName: row.labName,
    sitePolicy: row.sitePolicy,
    createdByName: row.createdByName,
    proposedByName: row.proposedByName,
    signedByName: row.signedByName,
    updatedByName: row.updatedByName,
    findings: caseFindings,
  };
}

export type CaseDetail = NonNullable<Awaited<ReturnType<typeof getCaseDetail>>>;

export async function listCaseHistory(caseId: string) {
  return db
    .select({
      id: caseEvents.id,
      at: caseEvents.at,
      action: caseEvents.action,
      changes: caseEvents.changes,
      reason: caseEvents.reason,
      userName: user.name,
    })
    .from(caseEvents)
    .leftJoin(user, eq(user.id, caseEvents.userId))
    .where(eq(caseEvents.caseId, caseId))
    .orderBy(desc(caseEvents.at));
}

export async function sitePolicy(siteId: string | null | undefined) {
  if (!siteId) return null;
  const [s] = await db
    .select({
      maxIn: sites.endPlayMaxIn,
      dialSpreadIn: sites.dialSpreadIn,
      tapeSpreadIn: sites.tapeSpreadIn,
      plausibleMaxIn: sites.plausibleMaxIn,
      kind: sites.kind,
    })
    .from(sites)
    .where(eq(sites.id, siteId));
  return s ?? null;
}
