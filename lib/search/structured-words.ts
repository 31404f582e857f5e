// Words that name a row, a zone, a removal trigger or a bearing class, so a search can act
// on the findings' and cases' own fields: "spall cup outboard row" means a subsurface spall
// recorded on the cup's outboard row, not four words somewhere in the notes. Shop words and
// one slip of the keyboard are understood (common practice in the shop: "ob", "outbd").
import { COMPONENTS, TRIGGERS } from "@/lib/classification";
import { rowLabel, triggerLabel, zoneLabel } from "@/lib/classification/labels";
import { BEARING_CLASSES } from "@/lib/cases/schemas";
import { stem, words } from "@/lib/classification/text-tokens";

export type StructuredRole = "row" | "zone" | "trigger" | "class";
export type StructuredMatch = { role: StructuredRole; codes: string[]; label: string };

const ROW_NAMES: Record<string, readonly string[]> = {
  inboard: ["inboard", "inbd", "ib", "in board", "inner row", "wheel side"],
  outboard: ["outboard", "outbd", "ob", "out board", "outer row", "end cap side"],
};

const ZONE_NAMES: Record<string, readonly string[]> = {
  raceway: ["raceway", "race", "race way", "track"],
  rib: ["rib", "flange", "cone rib", "guide flange"],
  "roller-end": ["roller end", "roller face"],
  "roller-body": ["roller body"],
  bore: ["bore", "cone bore"],
  "outside-surface": ["outside surface", "outside diameter", "od"],
};

const TRIGGER_NAMES: Record<string, readonly string[]> = {
  "wayside-hot": ["hot box", "hotbox", "hot bearing", "hbd", "hot bearing alarm"],
  "wayside-acoustic": ["acoustic", "acoustic alarm", "tadds"],
  "hand-roll": ["hand roll", "rough roll", "rough on hand roll"],
  "end-play-high": ["end play high", "loose end play", "excess end play"],
  "end-play-tight": ["tight", "zero end play", "will not turn"],
  "seal-grease": ["grease loss", "seal leak", "leaking seal"],
  welding: ["welding", "weld current"],
  "wheel-removal": ["wheelset", "wheel removal", "wheel change"],
  accident: ["derailment", "accident", "wreck"],
  scheduled: ["scheduled", "scheduled removal"],
};

type Name = { stems: string[]; role: StructuredRole; code: string; fuzzy: boolean };

const name = (role: StructuredRole, code: string, text: string): Name => {
  const ws = words(text);
  // one-letter slips only on one long word: "outbaord", "racway"; never on "ob" or "rib"
  return { stems: ws.map(stem), role, code, fuzzy: ws.length === 1 && ws[0].length >= 6 };
};

const NAMES: Name[] = [
  ...Object.entries(ROW_NAMES).flatMap(([code, list]) => list.map((t) => name("row", code, t))),
  ...Object.entries(ZONE_NAMES).flatMap(([code, list]) => list.map((t) => name("zone", code, t))),
  ...TRIGGERS.map((t) => name("trigger", t.code, t.label)),
  ...Object.entries(TRIGGER_NAMES).flatMap(([code, list]) => list.map((t) => name("trigger", code, t))),
  ...BEARING_CLASSES.filter((c) => c !== "other").flatMap((c) => [name("class", c, `class ${c}`), name("class", c, `${c} class`)]),
];

const LABELS: Record<StructuredRole, (code: string) => string> = {
  row: (c) => `${rowLabel(c).toLowerCase()} row`,
  zone: (c) => zoneLabel(c).toLowerCase(),
  trigger: (c) => `removed for: ${triggerLabel(c).toLowerCase()}`,
  class: (c) => `class ${c}`,
};

/** True when a and b differ by one edit (insert, delete, change, or swap of neighbours). */
export function oneEditApart(a: string, b: string): boolean {
  if (a === b) return false;
  if (Math.abs(a.length - b.length) > 1) return false;
  let i = 0;
  while (i < a.length && i < b.length && a[i] === b[i]) i++;
  const ra = a.slice(i),
    rb = b.slice(i);
  if (ra.length === rb.length)
    return ra.slice(1) === rb.slice(1) || (ra.length >= 2 && ra[0] === rb[1] && ra[1] === rb[0] && ra.slice(2) === rb.slice(2));
  return ra.length > rb.length ? ra.slice(1) === rb : rb.slice(1) === ra;
}

/**
 * What a run of typed words names, if it is a row, zone, trigger or class. A row may be
 * followed by the word "row" ("outboard row"). Exact names win over one-slip matches.
 */
export function structuredForRun(run: readonly string[]): StructuredMatch | null {
  const seq = run.length >= 2 && run[run.length - 1] === "row" ? run.slice(0, -1) : run;
  const stems = seq.map(stem);
  const exact = NAMES.filter((n) => n.stems.length === stems.length && n.stems.every((s, i) => s === stems[i]));
  const rowOnly = (list: Name[]) => (seq.length < run.length ? list.filter((n) => n.role === "row") : list);
  let hits = rowOnly(exact);
  if (!hits.length && seq.length === 1 && seq[0].length >= 6) {
    hits = rowOnly(NAMES.filter((n) => n.fuzzy && (oneEditApart(stems[0], n.stems[0]) || oneEditApart(seq[0], n.stems[0]))));
  }
  if (!hits.length) return null;
  const role = hits[0].role;
  const codes = [...new Set(hits.filter((n) => n.role === role).map((n) => n.code))];
  return { role, codes, label: codes.map(LABELS[role]).join(" or ") };
}

/** A finding's row: the one recorded, or the one its part belongs to (a cone, a roller row). */
export const FIXED_ROWS: readonly { component: string; row: string }[] = COMPONENTS.flatMap((c) =>
  "fixedRow" in c && c.fixedRow ? [{ component: c.code, row: c.fixedRow as string }] : [],
);
