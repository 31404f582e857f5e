// Everything a case report shows, loaded as plain data for lib/report's pure builder.
import "server-only";
import { aliasedTable, and, asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { caseLinks, cases, codeEntries, findings, photos, sites, user } from "@/db/schema";
import type { ReportSource } from "@/lib/report/types";
import { readableCases, type CaseViewer } from "./case-scope";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type PhotoObjectKeys = {
  id: string;
  sha256: string;
  fileName: string;
  contentType: string;
  originalKey: string;
  screenKey: string;
  thumbKey: string;
};
export type LoadedReport = {
  source: ReportSource;
  objects: PhotoObjectKeys[];
};

async function labelMaps(): Promise<NonNullable<ReportSource["labels"]>> {
  const rows = await db.select({ list: codeEntries.list, code: codeEntries.code, label: codeEntries.label }).from(codeEntries);
  const maps = { cause: {} as Record<string, string>, trigger: {} as Record<string, string>, damage: {} as Record<string, string> };
  for (const r of rows) maps[r.list][r.code] = r.label;
  return maps;
}

/** Loads a case by its id (UUID) or its number (TL-26-00042); null when there is none the viewer may read. */
export async function loadCaseReport(key: { id: string } | { number: string }, viewer: CaseViewer): Promise<LoadedReport | null> {
  if ("id" in key && !UUID.test(key.id)) return null;
  const [c] = await db
    .select()
    .from(cases)
    .where(and("id" in key ? eq(cases.id, key.id) : eq(cases.number, key.number), readableCases(viewer)));
  if (!c) return null;

  const lab = aliasedTable(sites, "lab");
  const peopleIds = [c.createdBy, c.receivedBy, c.proposedBy, c.signedBy].filter((x): x is string => Boolean(x));
  const [siteRows, labRows, people, findingRows, photoRows, linkRows, labels] = await Promise.all([
    c.siteId ? db.select().from(sites).where(eq(sites.id, c.siteId)) : Promise.resolve([]),
    c.labSiteId ? db.select({ code: lab.code, name: lab.name }).from(lab).where(eq(lab.id, c.labSiteId)) : Promise.resolve([]),
    peopleIds.length ? db.select({ id: user.id, name: user.name }).from(user).where(inArray(user.id, peopleIds)) : Promise.resolve([]),
    db.select().from(findings).where(eq(findings.caseId, c.id)).orderBy(asc(findings.createdAt), asc(findings.id)),
    db.select().from(photos).where(eq(photos.caseId, c.id)).orderBy(asc(photos.createdAt), asc(photos.id)),
    db
      .select({
        number: cases.number,
        status: cases.status,
        primaryCause: cases.primaryCause,
        removedOn: cases.removedOn,
        note: caseLinks.note,
      })
      .from(caseLinks)
      .innerJoin(cases, eq(cases.id, caseLinks.relatedId))
      // Related cases the reader may not read are left out, not masked: their number is news.
      .where(and(eq(caseLinks.caseId, c.id), readableCases(viewer)))
      .orderBy(asc(cases.number)),
    labelMaps(),
  ]);
  const name = (id: string | null) => (id ? (people.find((p) => p.id === id)?.name ?? null) : null);
  const site = siteRows[0];

  return {
    source: {
      case: c,
      site: site
        ? {
            code: site.code,
            name: site.name,
            endPlayMaxIn: site.endPlayMaxIn,
            dialSpreadIn: site.dialSpreadIn,
            tapeSpreadIn: site.tapeSpreadIn,
            plausibleMaxIn: site.plausibleMaxIn,
          }
        : null,
      lab: labRows[0] ?? null,
      people: { createdBy: name(c.createdBy), receivedBy: name(c.receivedBy), proposedBy: name(c.proposedBy), signedBy: name(c.signedBy) },
      findings: findingRows,
      photos: photoRows,
      related: linkRows,
      labels,
      generatedAt: new Date(),
    },
    objects: photoRows.map((p) => ({
      id: p.id,
      sha256: p.sha256,
      fileName: p.fileName,
      contentType: p.contentType,
      originalKey: p.originalKey,
      screenKey: p.screenKey,
      thumbKey: p.thumbKey,
    })),
  };
}
