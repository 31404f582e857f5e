// Teardown results for a planned case: findings drawn from the cause's recipes, grease, dispositions.
import { COMPONENTS, type ComponentCode, type RootCauseCode, type TriggerCode } from "../../lib/classification";
import { recipesFor, type Place, type Recipe } from "./finding-recipes";
import type { Rng } from "./prng";

export type FindingDraft = {
  component: ComponentCode;
  row: "inboard" | "outboard" | null;
  damageCode: string;
  severity: number;
  clockDeg: number | null;
  arcDeg: number | null;
  zone: string | null;
  lengthMm: number | null;
  widthMm: number | null;
  notes: string;
  /** When the analyst entered it; the history sets it. */
  createdAt?: Date;
};

const RINGS = new Set<ComponentCode>(["cup", "cone-inboard", "cone-outboard", "journal"]);

/** Degrees clockwise from 12 o'clock. Only the cup stands still, so only it has a fixed load zone. */
function clockFor(rng: Rng, place: Place, component: ComponentCode): number {
  const centre = component !== "cup" || place === "any" ? rng.int(0, 359) : place === "load" ? rng.normal(0, 16) : rng.normal(180, 22);
  return ((Math.round(centre) % 360) + 360) % 360;
}

export function oclock(deg: number): string {
  const hour = Math.round(deg / 30) % 12;
  return `${hour === 0 ? 12 : hour} o'clock`;
}

function draw(rng: Rng, r: Recipe): FindingDraft {
  const component = rng.pick(r.parts);
  const info = COMPONENTS.find((c) => c.code === component)!;
  const damageCode = typeof r.damage === "string" ? r.damage : rng.pick(r.damage);
  const clockDeg = r.place && RINGS.has(component) ? clockFor(rng, r.place, component) : null;
  const arcDeg = clockDeg !== null && r.arc ? rng.int(r.arc[0], r.arc[1]) : null;
  const size = r.size ?? (damageCode === "none" || !r.place ? null : ([5, 30, 3, 12] as const));
  const lengthMm = size ? Number(rng.real(size[0], size[1]).toFixed(1)) : null;
  const widthMm = size ? Number(Math.min(lengthMm!, rng.real(size[2], size[3])).toFixed(1)) : null;
  const row =
    "fixedRow" in info && info.fixedRow
      ? info.fixedRow
      : "hasRow" in info && info.hasRow
        ? rng.pick(["inboard", "outboard"] as const)
        : null;
  const note = rng.pick(r.notes).replace("{oclock}", clockDeg === null ? "the top" : oclock(clockDeg));
  return {
    component,
    row,
    damageCode,
    severity: rng.int(r.sev[0], r.sev[1]),
    clockDeg,
    arcDeg,
    zone: r.zone ?? null,
    lengthMm,
    widthMm,
    notes: note,
  };
}

/** One to four findings; a part is described once per damage code. */
export function drawFindings(rng: Rng, cause: RootCauseCode, trigger: TriggerCode): FindingDraft[] {
  const out: FindingDraft[] = [];
  for (const recipe of recipesFor(cause, trigger)) {
    if (out.length >= 4 || !rng.chance(recipe.p)) continue;
    const f = draw(rng, recipe);
    if (!out.some((o) => o.component === f.component && o.damageCode === f.damageCode)) out.push(f);
  }
  return out;
}

const LUBE_FROM_FINDING: Record<string, string> = {
  "lubricant.water": "water",
  "lubricant.debris": "debris",
  "lubricant.starved": "starved",
  "lubricant.degraded": "degraded",
};
const LUBE_BY_CAUSE: Partial<Record<RootCauseCode, string>> = {
  "end-of-life": "degraded",
  lubrication: "overheated",
  material: "debris",
  undetermined: "degraded",
  seal: "starved",
};
const LUBE_NOTES: Record<string, readonly string[]> = {
  normal: ["Clean grease, normal colour and fill.", "Grease looks and feels normal."],
  water: [
    "Milky grease, water drained out of the cup when stood on end.",
    "Emulsified, grey-white and wet; free water near the inboard seal.",
  ],
  debris: ["Gritty between the fingers; sand and some steel fines.", "Grease carries grit and metal flakes."],
  starved: ["Little grease left on the rollers; cage pockets dry.", "Fill well short; rollers nearly dry."],
  degraded: ["Dark and thick, gone stiff in places.", "Grease darkened and broken down."],
  overheated: ["Burnt smell, grease charred on the cone ribs.", "Grease run out from heat; what is left is black and crusted."],
};

export function lubricantFor(rng: Rng, cause: RootCauseCode, found: FindingDraft[]): { conditions: string[]; notes: string } {
  const conditions = [...new Set(found.map((f) => LUBE_FROM_FINDING[f.damageCode]).filter(Boolean))];
  const byCause = LUBE_BY_CAUSE[cause];
  if (byCause && !conditions.includes(byCause) && (conditions.length === 0 || cause === "lubrication")) conditions.push(byCause);
  if (conditions.length === 0) conditions.push("normal");
  return { conditions, notes: conditions.map((c) => rng.pick(LUBE_NOTES[c])).join(" ") };
}

const MAIN_PARTS: ComponentCode[] = [
  "cup",
  "cone-inboard",
  "cone-outboard",
  "rollers-inboard",
  "rollers-outboard",
  "seal-inboard",
  "seal-outboard",
];

/** Worst severity per part decides: 0–1 reuse or recondition, 2 recondition, 3+ scrap; seals never go back. */
export function dispositionsFor(rng: Rng, found: FindingDraft[]): Record<string, string> {
  const worst = new Map<string, number>();
  for (const f of found) worst.set(f.component, Math.max(worst.get(f.component) ?? 0, f.severity));
  const condemned = found.some((f) => f.severity >= 4);
  const out: Record<string, string> = {};
  for (const part of new Set<string>([...MAIN_PARTS, ...worst.keys()])) {
    if (part === "lubricant" || part === "journal") continue;
    const sev = worst.get(part) ?? 0;
    if (part.startsWith("seal")) out[part] = "scrap";
    else if (sev >= 3 || (condemned && /^(cup|cone|rollers)/.test(part))) out[part] = "scrap";
    else if (sev === 2) out[part] = "recondition";
    else out[part] = rng.chance(0.7) ? "recondition" : "reuse";
  }
  return out;
}
