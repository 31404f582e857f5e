// Plain-text helpers shared by code search and the similarity score: lower-case
// words, a short stop-word list and a crude suffix stemmer. Crude is enough here:
// both sides of every comparison go through the same steps.

const STOP_WORDS = new Set([
  "a",
  "about",
  "after",
  "all",
  "also",
  "an",
  "and",
  "any",
  "are",
  "as",
  "at",
  "be",
  "been",
  "before",
  "both",
  "but",
  "by",
  "can",
  "could",
  "did",
  "do",
  "does",
  "each",
  "for",
  "from",
  "had",
  "has",
  "have",
  "he",
  "her",
  "his",
  "if",
  "in",
  "into",
  "is",
  "it",
  "its",
  "may",
  "more",
  "most",
  "no",
  "not",
  "of",
  "on",
  "one",
  "or",
  "other",
  "our",
  "out",
  "over",
  "per",
  "she",
  "so",
  "some",
  "than",
  "that",
  "the",
  "their",
  "them",
  "then",
  "there",
  "these",
  "they",
  "this",
  "those",
  "to",
  "too",
  "under",
  "up",
  "upon",
  "very",
  "was",
  "we",
  "were",
  "what",
  "when",
  "where",
  "which",
  "while",
  "who",
  "will",
  "with",
  "would",
]);

/** Lower-cased words; hyphens and dots split words ("micro-pitting" → micro, pitting). */
export function words(text: string): string[] {
  return text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter((w) => w.length > 0);
}

export function isStopWord(word: string): boolean {
  return STOP_WORDS.has(word);
}

/** Strip common English suffixes so spall/spalls/spalling and pit/pitting meet. */
export function stem(word: string): string {
  let w = word;
  if (w.length > 4 && w.endsWith("ies")) w = `${w.slice(0, -3)}y`;
  for (const suffix of ["ings", "ing", "ed", "es", "s"]) {
    if (suffix === "s" && /(ss|us|is)$/.test(w)) continue;
    if (w.endsWith(suffix) && w.length - suffix.length >= 3) {
      w = w.slice(0, -suffix.length);
      break;
    }
  }
  if (/[ye]$/.test(w) && w.length > 3) w = w.slice(0, -1);
  if (/([^lsz])\1$/.test(w) && w.length > 3) w = w.slice(0, -1);
  return w;
}

/** Content words of a text as stems, each with the first surface form seen. */
export function contentStems(text: string): Map<string, string> {
  const stems = new Map<string, string>();
  for (const w of words(text)) {
    if (w.length < 3 || isStopWord(w) || !/[a-z]/.test(w)) continue;
    const s = stem(w);
    if (!stems.has(s)) stems.set(s, w);
  }
  return stems;
}
