// Marks the words a search matched inside a piece of narrative, and cuts a short snippet
// around the densest run of marks. Words compare by stem, as the search does, so
// "spall" marks "spalling"; several-word terms ("water etch") mark only as a whole run.
// Returns plain segments: the screen renders them, so no HTML is ever built from notes.
import { isStopWord, stem, words } from "@/lib/classification/text-tokens";

export interface Segment {
  readonly text: string;
  readonly hit: boolean;
}

export type CompiledTerms = readonly (readonly string[])[];

interface Token {
  readonly start: number;
  readonly end: number;
  readonly stem: string;
}

const normalise = (w: string) =>
  w
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase();

/** Stem sequences, longest first so "water etch" wins over "water". */
export function compileTerms(terms: readonly string[]): CompiledTerms {
  const seen = new Set<string>();
  const out: string[][] = [];
  for (const term of terms) {
    const ws = words(term);
    if (ws.length === 0 || ws.every(isStopWord)) continue;
    const stems = ws.map(stem);
    const key = stems.join(" ");
    if (!seen.has(key)) {
      seen.add(key);
      out.push(stems);
    }
  }
  return out.sort((a, b) => b.length - a.length);
}

function tokens(text: string): Token[] {
  return [...text.matchAll(/[\p{L}\p{N}]+/gu)].map((m) => ({
    start: m.index,
    end: m.index + m[0].length,
    stem: stem(normalise(m[0])),
  }));
}

/** Character ranges [start, end) of every match. */
function hitRanges(text: string, terms: CompiledTerms): [number, number][] {
  const toks = tokens(text);
  const ranges: [number, number][] = [];
  for (let i = 0; i < toks.length; ) {
    const term = terms.find((t) => t.every((s, j) => toks[i + j]?.stem === s));
    if (term) {
      ranges.push([toks[i].start, toks[i + term.length - 1].end]);
      i += term.length;
    } else i++;
  }
  return ranges;
}

function segmentsOf(text: string, ranges: readonly [number, number][], from = 0, to = text.length): Segment[] {
  const out: Segment[] = [];
  let at = from;
  for (const [s, e] of ranges) {
    if (e <= from || s >= to) continue;
    if (s > at) out.push({ text: text.slice(at, s), hit: false });
    out.push({ text: text.slice(Math.max(s, from), Math.min(e, to)), hit: true });
    at = Math.min(e, to);
  }
  if (at < to) out.push({ text: text.slice(at, to), hit: false });
  return out;
}

export function highlight(text: string, terms: CompiledTerms): Segment[] {
  return segmentsOf(text, hitRanges(text, terms));
}

export interface Snippet {
  readonly segments: Segment[];
  readonly hits: number;
}

/** Up to about maxChars of the text around its densest marks, with "…" where it was cut; null when nothing matched. */
export function snippet(text: string, terms: CompiledTerms, maxChars = 200): Snippet | null {
  const ranges = hitRanges(text, terms);
  if (ranges.length === 0) return null;
  if (text.length <= maxChars) return { segments: segmentsOf(text, ranges), hits: ranges.length };

  // The window that starts a little before some mark and holds the most marks.
  let best = { start: 0, count: -1 };
  for (const [s] of ranges) {
    const start = Math.max(0, s - Math.floor(maxChars / 4));
    const count = ranges.filter(([a, b]) => a >= start && b <= start + maxChars).length;
    if (count > best.count) best = { start, count };
  }
  let from = best.start;
  let to = Math.min(text.length, from + maxChars);
  // Cut at word boundaries, never through a mark.
  if (from > 0) {
    const space = text.indexOf(" ", from);
    const firstMark = ranges.find(([, e]) => e > from)![0];
    from = space >= 0 && space < firstMark ? space + 1 : Math.min(from, firstMark);
  }
  if (to < text.length) {
    const space = text.lastIndexOf(" ", to);
    if (space > from) to = space;
    const cut = ranges.find(([s, e]) => s < to && e > to);
    if (cut) to = cut[1];
  }
  const segments = segmentsOf(text, ranges, from, to);
  const shown = ranges.filter(([s, e]) => s >= from && e <= to).length;
  return {
    segments: [...(from > 0 ? [{ text: "…", hit: false }] : []), ...segments, ...(to < text.length ? [{ text: "…", hit: false }] : [])],
    hits: shown,
  };
}

/** Marks every case-insensitive occurrence of the needles (serials, car and case numbers). */
export function highlightSubstrings(text: string, needles: readonly string[]): Segment[] {
  const lower = text.toLowerCase();
  const ranges: [number, number][] = [];
  for (const n of needles.map((x) => x.toLowerCase()).filter((x) => x.length >= 2)) {
    for (let at = lower.indexOf(n); at >= 0; at = lower.indexOf(n, at + n.length)) ranges.push([at, at + n.length]);
  }
  ranges.sort((a, b) => a[0] - b[0]);
  const merged: [number, number][] = [];
  for (const r of ranges) {
    const last = merged[merged.length - 1];
    if (last && r[0] <= last[1]) last[1] = Math.max(last[1], r[1]);
    else merged.push([...r]);
  }
  return segmentsOf(text, merged);
}
