// Fuzzy search over a code list for the code picker. Exact and prefix hits on a
// code, label or shop word always outrank fuzzy ones, so "rust" lands on water
// etch before anything that merely contains "rust"; typos ("spaling", "russt")
// still find their code through fuse.js.
import Fuse from "fuse.js";
import { isStopWord, stem, words } from "./text-tokens";

export interface CodeSearchEntry {
  readonly code: string;
  readonly label: string;
  readonly description?: string;
  readonly synonyms?: readonly string[];
  readonly retired?: boolean;
}

export type MatchedOn = "code" | "label" | "synonym" | "description";

export interface CodeSearchHit<E extends CodeSearchEntry> {
  readonly entry: E;
  /** 0..1, higher is better; 1 is an exact code or label match, 0 means no query was given. */
  readonly score: number;
  readonly matchedOn: MatchedOn;
  readonly matchedText: string;
}

export interface CodeSearchOptions {
  /** Retired codes stay findable for old cases but are hidden from pickers by default. */
  readonly includeRetired?: boolean;
  readonly limit?: number;
}

interface Row {
  readonly entryIndex: number;
  readonly field: MatchedOn;
  readonly text: string;
  readonly norm: string;
  readonly stems: string;
}

// A description match is weaker evidence than a name the user would type.
const FIELD_WEIGHT: Record<MatchedOn, number> = { code: 1, label: 1, synonym: 0.97, description: 0.7 };
// Relevance tiers for non-fuzzy hits; fuzzy relevance is capped below them.
const EXACT = 1,
  SAME_STEMS = 0.95,
  PREFIX = 0.9,
  WORD_START = 0.86,
  FUZZY_CAP = 0.85;
// Fuzzy hits weaker than this are noise (a long description always contains something close).
const MIN_FUZZY = 0.6;
// Multi-word queries whose words match separately count a little less than a phrase hit.
const PER_WORD_FACTOR = 0.8;

const normalise = (text: string) => words(text).join(" ");
const stemKey = (text: string) => words(text).map(stem).join(" ");

function rowsOf(entries: readonly CodeSearchEntry[]): Row[] {
  const rows: Row[] = [];
  entries.forEach((entry, entryIndex) => {
    const add = (field: MatchedOn, text: string | undefined) => {
      if (text && normalise(text)) rows.push({ entryIndex, field, text, norm: normalise(text), stems: stemKey(text) });
    };
    add("code", entry.code);
    add("label", entry.label);
    for (const synonym of entry.synonyms ?? []) add("synonym", synonym);
    add("description", entry.description);
  });
  return rows;
}

function tierOf(row: Row, query: string, queryStems: string): number {
  if (row.norm === query || row.text.toLowerCase() === query) return EXACT;
  if (row.stems === queryStems) return SAME_STEMS;
  if (row.norm.startsWith(query)) return PREFIX;
  if (` ${row.norm}`.includes(` ${query}`)) return WORD_START;
  return 0;
}

export function createCodeSearch<E extends CodeSearchEntry>(entries: readonly E[]) {
  const rows = rowsOf(entries);
  const fuse = new Fuse(rows, {
    keys: ["norm"],
    includeScore: true,
    threshold: 0.35,
    ignoreLocation: true,
    minMatchCharLength: 2,
  });

  /** Best relevance per entry for one phrase (already normalised). */
  function bestPerEntry(phrase: string): Map<number, { relevance: number; row: Row }> {
    const best = new Map<number, { relevance: number; row: Row }>();
    const consider = (row: Row, tier: number, floor: number) => {
      const relevance = tier * FIELD_WEIGHT[row.field];
      const current = best.get(row.entryIndex);
      if (relevance > floor && (!current || relevance > current.relevance)) best.set(row.entryIndex, { relevance, row });
    };
    const phraseStems = stemKey(phrase);
    for (const row of rows) consider(row, tierOf(row, phrase, phraseStems), 0);
    for (const hit of fuse.search(phrase)) consider(hit.item, Math.min(FUZZY_CAP, 1 - (hit.score ?? 1)), MIN_FUZZY);
    return best;
  }

  return function search(rawQuery: string, opts: CodeSearchOptions = {}): CodeSearchHit<E>[] {
    const visible = (i: number) => opts.includeRetired || !entries[i].retired;
    const query = normalise(rawQuery);
    let hits: { index: number; score: number; matchedOn: MatchedOn; matchedText: string }[];
    if (!query) {
      hits = entries.map((e, index) => ({ index, score: 0, matchedOn: "label" as const, matchedText: e.label }));
    } else {
      const combined = new Map<number, { relevance: number; row: Row }>(bestPerEntry(query));
      const queryWords = query.split(" ").filter((w) => w.length >= 2 && !isStopWord(w));
      // Words that match no entry at all ("cup" in "rusty cup") neither help nor penalise.
      const perWord = queryWords.length > 1 ? queryWords.map(bestPerEntry).filter((m) => m.size > 0) : [];
      const indices = new Set(perWord.flatMap((m) => [...m.keys()]));
      for (const index of indices) {
        const matched = perWord.map((m) => m.get(index)).filter((x) => x !== undefined);
        const strongest = matched.reduce((a, b) => (b.relevance > a.relevance ? b : a));
        // Half the best word, half the mean over all words: one telling word leads, more words add.
        const mean = matched.reduce((total, m) => total + m.relevance, 0) / perWord.length;
        const relevance = ((strongest.relevance + mean) / 2) * PER_WORD_FACTOR;
        if (relevance > (combined.get(index)?.relevance ?? 0)) combined.set(index, { relevance, row: strongest.row });
      }
      hits = [...combined].map(([index, { relevance, row }]) => ({
        index,
        score: Math.round(relevance * 1e6) / 1e6,
        matchedOn: row.field,
        matchedText: row.text,
      }));
    }
    return hits
      .filter((h) => visible(h.index))
      .sort((a, b) => b.score - a.score || a.index - b.index)
      .slice(0, opts.limit ?? entries.length)
      .map((h) => ({ entry: entries[h.index], score: h.score, matchedOn: h.matchedOn, matchedText: h.matchedText }));
  };
}
