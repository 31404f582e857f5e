// Turn the shop words in a free-text query into the codes and labels they point
// to, so a full-text search for "rust" also finds cases that say "water etch".
// Matching is on whole words after stemming; a single longer word may also be
// one typo away from a one-word shop term ("russt" → rust). Anything looser
// would flood a full-text search with unrelated codes.
import type { CodeSearchEntry } from "./code-search";
import { stem, words } from "./text-tokens";

const TYPO_MIN_QUERY_WORD = 5;
const TYPO_MIN_TERM = 4;

/** Optimal string alignment distance (Levenshtein plus adjacent swaps), stopping early past 1. */
function withinOneEdit(a: string, b: string): boolean {
  if (Math.abs(a.length - b.length) > 1) return false;
  const prev2: number[] = [];
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      row[j] = Math.min(prev[j] + 1, row[j - 1] + 1, prev[j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) row[j] = Math.min(row[j], prev2[j - 2] + 1);
    }
    prev2.splice(0, prev2.length, ...prev);
    prev = row;
    if (Math.min(...row) > 1) return false;
  }
  return prev[b.length] <= 1;
}

function containsRun(haystack: string[], needle: string[]): number {
  outer: for (let i = 0; i + needle.length <= haystack.length; i++) {
    for (let j = 0; j < needle.length; j++) if (haystack[i + j] !== needle[j]) continue outer;
    return i;
  }
  return -1;
}

export function expandQueryWithSynonyms(query: string, entries: readonly CodeSearchEntry[]): string[] {
  const queryWords = words(query);
  const queryStems = queryWords.map(stem);
  const found: { position: number; order: number; entry: CodeSearchEntry }[] = [];

  entries.forEach((entry, order) => {
    let position = -1;
    for (const term of [entry.code, entry.label, ...(entry.synonyms ?? [])]) {
      const termWords = words(term);
      if (termWords.length === 0) continue;
      let at = containsRun(queryStems, termWords.map(stem));
      if (at < 0 && termWords.length === 1 && termWords[0].length >= TYPO_MIN_TERM) {
        at = queryWords.findIndex((w) => w.length >= TYPO_MIN_QUERY_WORD && withinOneEdit(w, termWords[0]));
      }
      if (at >= 0 && (position < 0 || at < position)) position = at;
    }
    if (position >= 0) found.push({ position, order, entry });
  });

  const out: string[] = [];
  for (const { entry } of found.sort((a, b) => a.position - b.position || a.order - b.order)) {
    for (const s of [entry.code, entry.label]) if (!out.includes(s)) out.push(s);
  }
  return out;
}
