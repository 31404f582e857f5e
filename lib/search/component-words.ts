// Words that name a part of the bearing, so "spall cup" also finds a case whose cup
// finding is coded but whose notes never say "cup". Names come from the part list;
// a few shop words are added where the trade uses another name (common practice).
import { COMPONENTS } from "@/lib/classification/bearing-parts";
import { stem, words } from "@/lib/classification/text-tokens";

const EXTRA_NAMES: Record<string, readonly string[]> = {
  lubricant: ["grease", "grease fill"],
  "rollers-inboard": ["roller"],
  "rollers-outboard": ["roller"],
  "cage-inboard": ["retainer"],
  "cage-outboard": ["retainer"],
  "cap-screws": ["cap screw", "bolts"],
  journal: ["axle end"],
};

/** "Cone, inboard" → "cone"; "Lubricant (grease fill)" → "lubricant". */
const headName = (label: string) => label.split(/[,(]/)[0].trim();

const NAMES: { stems: string[]; code: string }[] = COMPONENTS.flatMap((c) =>
  [headName(c.label), ...(EXTRA_NAMES[c.code] ?? [])].map((name) => ({ stems: words(name).map(stem), code: c.code })),
);

/** Parts whose name is exactly this run of words. */
export function componentsForRun(run: readonly string[]): string[] {
  const runStems = run.map(stem);
  const codes = NAMES.filter((n) => n.stems.length === runStems.length && n.stems.every((s, i) => s === runStems[i])).map((n) => n.code);
  return [...new Set(codes)];
}
