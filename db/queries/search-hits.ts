// One page of search hits with what the result list shows: the case at a glance, its
// findings (those the query named are flagged), and snippets of the narrative with the
// matched words marked.
import "server-only";
import { componentLabel } from "@/lib/classification/labels";
import { asc, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { cases, findings, sites } from "@/db/schema";
import type { Stage } from "@/lib/cases/stages";
import { compileTerms, highlightSubstrings, snippet, type Segment } from "@/lib/search/highlight";
import type { SearchLookups } from "./search-lookups";
import type { PreparedClause } from "./search-terms";

export interface SearchHitFinding {
  readonly component: string;
  readonly componentLabel: string;
  readonly code: string;
  readonly label: string;
  readonly severity: number;
  /** The query named this code (or this part, for a damage finding). */
  readonly matched: boolean;
}

export interface SearchHit {
  readonly id: string;
  readonly number: Segment[];
  readonly caseNumber: string;
  readonly status: Stage;
  readonly serial: Segment[];
  readonly car: Segment[];
  readonly trigger: string;
  readonly triggerLabel: string;
  readonly causeLabel: string | null;
  readonly bearingClass: string;
  readonly removedOn: string | null;
  readonly siteName: string | null;
  readonly maxSeverity: number;
  readonly score: number;
  readonly findings: SearchHitFinding[];
  readonly snippets: { field: string; segments: Segment[] }[];
}

const SNIPPETS_SHOWN = 2;
const PLAIN_PREVIEW = 180;

export async function loadHits(
  page: readonly { id: string; rank: number }[],
  clauses: readonly PreparedClause[],
  lookups: SearchLookups,
  hasQuery: boolean,
): Promise<SearchHit[]> {
  if (page.length === 0) return [];
  const ids = page.map((p) => p.id);
  const [rows, findingRows] = await Promise.all([
    db
      .select({
        id: cases.id,
        number: cases.number,
        status: cases.status,
        serial: cases.serial,
        carMark: cases.carMark,
        carNumber: cases.carNumber,
        trigger: cases.trigger,
        primaryCause: cases.primaryCause,
        bearingClass: cases.bearingClass,
        removedOn: cases.removedOn,
        siteName: sites.name,
        fieldNotes: cases.fieldNotes,
        teardownNotes: cases.teardownNotes,
        verdictNotes: cases.verdictNotes,
        correctiveAction: cases.correctiveAction,
      })
      .from(cases)
      .leftJoin(sites, eq(sites.id, cases.siteId))
      .where(inArray(cases.id, ids)),
    db
      .select({
        caseId: findings.caseId,
        component: findings.component,
        code: findings.damageCode,
        severity: findings.severity,
        notes: findings.notes,
      })
      .from(findings)
      .where(inArray(findings.caseId, ids))
      .orderBy(asc(findings.createdAt)),
  ]);

  const terms = compileTerms(clauses.flatMap((c) => c.highlight));
  const idNeedles = clauses.filter((c) => c.kind === "identifier").map((c) => c.text);
  const namedCodes = new Set(clauses.flatMap((c) => c.codes));
  const namedParts = new Set(clauses.flatMap((c) => c.components));
  const byId = new Map(rows.map((r) => [r.id, r]));

  return page.flatMap(({ id, rank }) => {
    const r = byId.get(id);
    if (!r) return [];
    const fs = findingRows.filter((f) => f.caseId === id);
    const fields = [
      ...fs.map((f) => ({ field: `Finding · ${componentLabel(f.component)}`, text: f.notes })),
      { field: "Teardown", text: r.teardownNotes },
      { field: "Verdict", text: r.verdictNotes },
      { field: "Field report", text: r.fieldNotes },
      { field: "Corrective action", text: r.correctiveAction },
    ].filter((f) => f.text.trim() !== "");
    const snippets = fields
      .map((f, order) => ({ field: f.field, order, s: snippet(f.text, terms) }))
      .filter((x) => x.s !== null)
      .sort((a, b) => b.s!.hits - a.s!.hits || a.order - b.order)
      .slice(0, SNIPPETS_SHOWN)
      .map((x) => ({ field: x.field, segments: x.s!.segments }));
    if (snippets.length === 0 && !hasQuery && fields.length) {
      const first = fields.find((f) => f.field === "Teardown") ?? fields[0];
      const text = first.text.length > PLAIN_PREVIEW ? `${first.text.slice(0, PLAIN_PREVIEW).replace(/\s+\S*$/, "")} …` : first.text;
      snippets.push({ field: first.field, segments: [{ text, hit: false }] });
    }
    const seen = new Set<string>();
    const hitFindings = fs
      .filter((f) => !seen.has(`${f.component}|${f.code}`) && seen.add(`${f.component}|${f.code}`))
      .map((f) => ({
        component: f.component,
        componentLabel: componentLabel(f.component),
        code: f.code,
        label: lookups.labels.damage.get(f.code) ?? f.code,
        severity: f.severity,
        matched: namedCodes.has(f.code) || (f.code !== "none" && namedParts.has(f.component)),
      }));
    return [
      {
        id,
        caseNumber: r.number,
        number: highlightSubstrings(r.number, idNeedles),
        status: r.status,
        serial: highlightSubstrings(r.serial, idNeedles),
        car: highlightSubstrings(`${r.carMark} ${r.carNumber}`.trim(), idNeedles),
        trigger: r.trigger,
        triggerLabel: lookups.labels.trigger.get(r.trigger) ?? r.trigger,
        causeLabel: r.primaryCause ? (lookups.labels.cause.get(r.primaryCause) ?? r.primaryCause) : null,
        bearingClass: r.bearingClass,
        removedOn: r.removedOn,
        siteName: r.siteName,
        maxSeverity: fs.reduce((m, f) => Math.max(m, f.severity), 0),
        score: Number(rank),
        findings: hitFindings,
        snippets,
      },
    ];
  });
}
