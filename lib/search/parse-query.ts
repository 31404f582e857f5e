// Turns what someone typed into search clauses. Every clause must match a case; a clause
// matches through the narrative words, or through a damage code its shop words name
// ("rust" → water etch), or a part it names ("cup"), so a case coded right but written up
// in other words is still found. Tokens with digits are serials, car or case numbers.
import type { CodeSearchEntry } from "@/lib/classification/code-search";
import { expandQueryWithSynonyms } from "@/lib/classification/query-expansion";
import { isStopWord, stem, words } from "@/lib/classification/text-tokens";
import { componentsForRun } from "./component-words";

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
}

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

function clauseFor(run: readonly string[], entries: readonly CodeSearchEntry[]): SearchClause | null {
  const exact = entriesForRun(run, entries);
  const matched = run.length === 1 && exact.length === 0 ? entriesForWord(run[0], entries) : exact;
  const components = componentsForRun(run);
  if (run.length > 1 && matched.length === 0 && components.length === 0) return null;
  const single = run.length === 1 ? run[0] : null;
  return {
    kind: "words",
    text: run.join(" "),
    words: [...run],
    codes: matched.map((e) => e.code),
    components,
    correctable: !!single && single.length >= MIN_CORRECTABLE && exact.length === 0 && components.length === 0 && /^[a-z]+$/.test(single),
    highlight: [...new Set([run.join(" "), ...matched.flatMap((e) => [e.label, ...(e.synonyms ?? [])])])],
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
          kind: "phrase", text: ws.join(" "), words: ws, codes: named.map((e) => e.code), components: [],
          correctable: false, highlight: [ws.join(" ")],
        });
      }
      continue;
    }
    const token = trimToken(m[2]);
    if (/\d/.test(token)) {
      flush();
      const id = token.slice(0, IDENTIFIER_MAX);
      clauses.push({ kind: "identifier", text: id, words: words(id), codes: [], components: [], correctable: false, highlight: [id] });
    } else pending.push(...words(token));
  }
  flush();
  return clauses.slice(0, MAX_CLAUSES);
}

/** Every damage code the query names, for ranking boosts and chips. */
export const codesIn = (clauses: readonly SearchClause[]) => [...new Set(clauses.flatMap((c) => c.codes))];
