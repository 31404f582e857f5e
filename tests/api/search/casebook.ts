// A small invented casebook for the search and similar-case tests. Every case carries a
// marker word made for this run, so cases other tests create never enter the assertions,
// and the similar-case book is dated long before any other test's cases, so none of theirs
// can be an "earlier case" of it.
import { createCase, siteId, userId } from "../../support/factories";

type CaseInput = Parameters<typeof createCase>[0];

/** A word no other case contains: letters only, so the full-text index keeps it whole. */
export function markerWord(): string {
  const letters = "bcdfghjkmnpqrstvwxz";
  return `qz${Array.from({ length: 9 }, () => letters[Math.floor(Math.random() * letters.length)]).join("")}`;
}

export async function caseWith(marker: string, input: CaseInput & { notes: string }) {
  const { notes, ...rest } = input;
  return createCase({ teardownNotes: `${notes} ${marker}`, ...rest });
}

export const ids = (rows: { id: string }[]) => rows.map((r) => r.id);

export async function people() {
  return {
    mjc: await siteId("MJC"),
    pyc: await siteId("PYC"),
    inspector: await userId("inspector"),
    analyst: await userId("analyst"),
  };
}

export type SearchBody = {
  total: number;
  hits: {
    id: string;
    caseNumber: string;
    snippets: { field: string; segments: { text: string; hit: boolean }[] }[];
    findings: { code: string; matched: boolean }[];
    serial: { text: string; hit: boolean }[];
    car: { text: string; hit: boolean }[];
  }[];
  facets: Record<string, { value: string; count: number; selected: boolean }[]>;
  understood: { text: string; corrections: string[]; codes: { code: string }[] }[];
};

export const hitIds = (b: SearchBody) => b.hits.map((h) => h.id);
export const marked = (b: SearchBody, id: string) =>
  b.hits.find((h) => h.id === id)!.snippets.flatMap((s) => s.segments.filter((x) => x.hit).map((x) => x.text.toLowerCase()));
export const facetCount = (b: SearchBody, facet: string, value: string) => b.facets[facet].find((v) => v.value === value)?.count ?? 0;
