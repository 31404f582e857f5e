// Word overlap between two narratives: Dice coefficient over content-word stems.
// Dice rather than Jaccard because notes are short and of uneven length, and one
// long note should not wipe out a handful of telling shared words.
import { contentStems } from "@/lib/classification/text-tokens";
import { MAX_WORDS_SHOWN } from "./weights";

export function sharedWords(textA: string, textB: string): { value: number; words: string[]; shown: string } {
  const a = contentStems(textA);
  const b = contentStems(textB);
  if (a.size === 0 || b.size === 0) return { value: 0, words: [], shown: "" };
  // In the order they appear in the first text, in the first text's spelling.
  const words = [...a].filter(([s]) => b.has(s)).map(([, surface]) => surface);
  const value = (2 * words.length) / (a.size + b.size);
  const more = words.length - MAX_WORDS_SHOWN;
  const shown = words.slice(0, MAX_WORDS_SHOWN).join(", ") + (more > 0 ? ` and ${more} more` : "");
  return { value, words, shown };
}
