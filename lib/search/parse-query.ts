// Turns what someone typed into search clauses. Every clause must match a case; a clause
// matches through the narrative words, or through a damage code its shop words name
// ("rust" → water etch), or a part it names ("cup"), so a case coded right but written up
// in other words is still found. Tokens with digits are serials, car or case numbers.
import type { CodeSearchEntry } from "@/lib/classification/code-search";
import { expandQueryWithSynonyms } from "@/lib/classification/query-expansion";
import { isStopWord, stem, words } from "@/lib/classification/text-tokens";
import { componentsForRun } from "./component-words";
import { structuredForRun } from "./structured-words";

export type ClauseKind = "words" | "phrase" | "identifier";

export interface SearchClause {
  readonly kind: ClauseKind;
  /** As typed (normalised), for the "searched for" line. */
  readonly text: string;
  /** Narrative words; for a phrase, in order. */
  readonly words: readonly string[];
  /** Damage codes named by a code, label or shop word. */
  readonly codes: readonly string[];
  /** Parts named, e.g. "cone" → both cones. */
  readonly components: readonly string[];
  /** A single word that is no shop term: the query may swap in near known words. */
  readonly correctable: boolean;
  /** Terms to mark in snippets: the words and the shop words of the codes named. */
  readonly highlight: readonly string[];
  /** Rows, zones, removal triggers and bearing classes the words name. */
  readonly rows: readonly string[];
  readonly zones: readonly string[];
  readonly triggers: readonly string[];
  readonly classes: readonly string[];
  /** The words searched as text ("outboard row" searches "outboard"; "class F" nothing). */
  readonly searchText: string;
  /** How the clause was understood, in words ("cup", "outboard row", "subsurface spall"). */
  readonly reading: string;
}

const NO_FIELDS = { rows: [], zones: [], triggers: [], classes: [] } as const;

const MAX_CLAUSES = 12;
const MAX_RUN = 4;
const MIN_CORRECTABLE = 4;
const IDENTIFIER_MAX = 40;

const stemsOf = (text: string) => words(text).map(stem);
const sameRun = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((x, i) => x === b[i]);
const termsOf = (e: CodeSearchEntry) => [e.code, e.label, ...(e.synonyms ?? [])];

/** Entries one of whose terms is exactly this run of words (after stemming). */
function entriesForRun(run: readonly string[], entries: readonly CodeSearchEntry[]): CodeSearchEntry[] {
  const runStems = run.map(stem);
  return entries.filter((e) => termsOf(e).some((t) => sameRun(stemsOf(t), runStems)));
}

/** Codes for one word, forgiving one typo in longer words (the classification's own rule). */
function entriesForWord(word: string, entries: readonly CodeSearchEntry[]): CodeSearchEntry[] {
  const named = new Set(expandQueryWithSynonyms(word, entries));
  return entries.filter((e) => named.has(e.code));
}

/** Parts read back in words: "cone" names both cones but reads as "cone". */
const partWords = (run: readonly string[], components: readonly string[]) => (components.length ? run.join(" ") : "");

function clauseFor(run: readonly string[], entries: readonly CodeSearchEntry[]): SearchClause | null {
  const exact = entriesForRun(run, entries);
  const components = componentsForRun(run);
  // a row, zone, trigger or class, unless the words are a damage or part name first
  const field = exact.length === 0 && components.length === 0 ? structuredForRun(run) : null;
  if (field) {
    const ws = field.role === "row" && run[run.length - 1] === "row" ? run.slice(0, -1) : run;
    return {
      kind: "words",
      text: run.join(" "),
      words: [...ws],
      codes: [],
      components: [],
      correctable: false,
      highlight: [ws.join(" ")],
      rows: field.role === "row" ? field.codes : [],
      zones: field.role === "zone" ? field.codes : [],
      triggers: field.role === "trigger" ? field.codes : [],
      classes: field.role === "class" ? field.codes : [],
      searchText: field.role === "class" ? "" : ws.join(" "),
      reading: field.label,
    };
  }
  const matched = run.length === 1 && exact.length === 0 ? entriesForWord(run[0], entries) : exact;
  if (run.length > 1 && matched.length === 0 && components.length === 0) return null;
  const single = run.length === 1 ? run[0] : null;
  const damageWords = matched.map((e) => e.label.toLowerCase()).join(" or ");
  return {
    kind: "words",
    text: run.join(" "),
    words: [...run],
    codes: matched.map((e) => e.code),
    components,
    correctable: !!single && single.length >= MIN_CORRECTABLE && exact.length === 0 && components.length === 0 && /^[a-z]+$/.test(single),
    highlight: [...new Set([run.join(" "), ...matched.flatMap((e) => [e.label, ...(e.synonyms ?? [])])])],
    ...NO_FIELDS,
    searchText: run.join(" "),
    reading: [partWords(run, components), damageWords].filter(Boolean).join(" / ") || run.join(" "),
  };
}

/** Plain words, longest known term first: "water etch" is one clause, "deep spall" two. */
function wordClauses(seq: readonly string[], entries: readonly CodeSearchEntry[]): SearchClause[] {
  const out: SearchClause[] = [];
  let i = 0;
  outer: while (i < seq.length) {
    for (let len = Math.min(MAX_RUN, seq.length - i); len >= 2; len--) {
      const clause = clauseFor(seq.slice(i, i + len), entries);
      if (clause) {
        out.push(clause);
        i += len;
        continue outer;
      }
    }
    const w = seq[i++];
    if (w.length < 2 || isStopWord(w)) continue;
    const clause = clauseFor([w], entries);
    if (clause) out.push(clause);
  }
  return out;
}

const trimToken = (t: string) => t.replace(/^[^\p{L}\p{N}]+|[^\p{L}\p{N}]+$/gu, "");

export function parseSearchText(raw: string, entries: readonly CodeSearchEntry[]): SearchClause[] {
  const clauses: SearchClause[] = [];
  let pending: string[] = [];
  const flush = () => {
    clauses.push(...wordClauses(pending, entries));
    pending = [];
  };
  for (const m of raw.slice(0, 300).matchAll(/"([^"]*)"?|(\S+)/g)) {
    if (m[1] !== undefined) {
      flush();
      const ws = words(m[1]);
      if (ws.length === 1) clauses.push(...wordClauses(ws, entries));
      else if (ws.length > 1) {
        const named = entriesForRun(ws, entries);
        clauses.push({
          kind: "phrase",
          text: ws.join(" "),
          words: ws,
          codes: named.map((e) => e.code),
          components: [],
          correctable: false,
          highlight: [ws.join(" ")],
          ...NO_FIELDS,
          searchText: ws.join(" "),
          reading: `“${ws.join(" ")}”`,
        });
      }
      continue;
    }
    const token = trimToken(m[2]);
    if (/\d/.test(token)) {
      flush();
      const id = token.slice(0, IDENTIFIER_MAX);
      clauses.push({
        kind: "identifier",
        text: id,
        words: words(id),
        codes: [],
        components: [],
        correctable: false,
        highlight: [id],
        ...NO_FIELDS,
        searchText: words(id).join(" "),
        reading: id,
      });
    } else pending.push(...words(token));
  }
  flush();
  return clauses.slice(0, MAX_CLAUSES);
}

/** The search text without one clause: what "drop this part of the reading" links to. */
export function queryWithout(clauses: readonly SearchClause[], index: number): string {
  return clauses
    .filter((_, i) => i !== index)
    .map((c) => (c.kind === "phrase" ? `"${c.text}"` : c.text))
    .join(" ");
}

/** Clauses that name something a finding records: a damage, a part, a row or a zone. */
export const namesFinding = (c: SearchClause) =>
  c.kind === "words" && (c.codes.length > 0 || c.components.length > 0 || c.rows.length > 0 || c.zones.length > 0);

/** Every damage code the query names, for ranking boosts and chips. */
export const codesIn = (clauses: readonly SearchClause[]) => [...new Set(clauses.flatMap((c) => c.codes))];
