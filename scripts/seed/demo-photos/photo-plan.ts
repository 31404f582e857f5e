// Which demo cases get photos, of which findings, and how each photo is tagged and captioned.
// Pure: it reads case rows and returns the plan, so the same casebook always gets the same photos.
import { COMPONENTS } from "../../../lib/classification/bearing-parts";
import { damageCodeInfo } from "../../../lib/classification";
import { oclock } from "../findings";
import { WATER_RUN } from "../demo-groups";
import type { DemoPhotoSpec, PhotoView } from "./draw-photo";

export const DEMO_PHOTO_SEED = 20261201;
export const PHOTO_CASES = 25;

export type PlanFinding = {
  id: string;
  component: string;
  row: "inboard" | "outboard" | null;
  damageCode: string;
  zone: string | null;
  severity: number;
  clockDeg: number | null;
  notes: string;
  createdAt: Date;
};
export type PlanCase = { id: string; number: string; status: string; removedOn: string | null; findings: PlanFinding[] };

export type PlannedPhoto = {
  caseId: string;
  caseNumber: string;
  fileName: string;
  spec: DemoPhotoSpec;
  tags: { component: string; row: string | null; clockDeg: number | null; findingId: string; caption: string };
  /** When the camera took it and when it was uploaded. */
  takenAt: Date;
  uploadedAt: Date;
};

/** Codes shown once each after the stories (arc burns, water etch, spalls), most telling first. */
const SHOWCASE = [
  "electrical.fluting",
  "deformation.overload",
  "deformation.debris",
  "corrosion.false-brinell",
  "heat.discoloration",
  "seal.damaged",
  "seal.leaking",
  "mounting.cap-screw",
  "fracture.fatigue",
  "wear.adhesive",
  "lubricant.water",
  "mounting.fit",
  "lubricant.starved",
  "cage.broken",
  "corrosion.fretting",
  "fracture.forced",
  "fatigue.surface",
  "wear.abrasive",
];

const has = (c: PlanCase, code: string) => c.findings.some((f) => f.damageCode === code);
const open = (c: PlanCase) => c.status !== "signed";

/** FNV-1a: a stable number from text, to seed each photo. */
export function textSeed(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return (h ^ DEMO_PHOTO_SEED) >>> 0;
}

/** The cases to photograph, each with the damage code that earned it a place. */
export function pickPhotoCases(all: readonly PlanCase[], limit = PHOTO_CASES): { c: PlanCase; lead: string }[] {
  const pool = [...all]
    .filter((c) => c.status !== "field" && c.findings.some((f) => f.damageCode !== "none"))
    .sort((a, b) => a.number.localeCompare(b.number));
  const chosen: { c: PlanCase; lead: string }[] = [];
  const take = (c: PlanCase, lead: string) => chosen.length < limit && !chosen.some((x) => x.c.id === c.id) && chosen.push({ c, lead });
  const inWaterRun = (c: PlanCase) => !!c.removedOn && c.removedOn >= WATER_RUN[0] && c.removedOn <= WATER_RUN[1];

  for (const c of pool.filter((c) => has(c, "electrical.arc")).slice(0, 6)) take(c, "electrical.arc");
  for (const c of pool.filter((c) => has(c, "corrosion.moisture") && inWaterRun(c)).slice(0, 6)) take(c, "corrosion.moisture");
  // Spalls: the open ones first (they show on the bench and sign-off lists), then spread over time.
  const spalls = pool.filter((c) => has(c, "fatigue.subsurface"));
  const spread = spalls.filter((c) => !open(c)).filter((_, i, list) => i % Math.max(1, Math.floor(list.length / 4)) === 0);
  for (const c of [...spalls.filter(open), ...spread].slice(0, 5)) take(c, "fatigue.subsurface");
  for (const code of SHOWCASE) {
    const withCode = pool.filter((c) => has(c, code));
    const c =
      withCode.find((x) => open(x) && !chosen.some((y) => y.c.id === x.id)) ?? withCode.find((x) => !chosen.some((y) => y.c.id === x.id));
    if (c) take(c, code);
  }
  return chosen;
}

const componentLabel = (code: string) => COMPONENTS.find((c) => c.code === code)?.label ?? code;

/** Strip words: "cup, outboard", "cone, inboard", "grease". */
export function partWords(f: Pick<PlanFinding, "component" | "row">): string {
  if (f.component === "lubricant") return "grease";
  const label = componentLabel(f.component).toLowerCase().replace(" row", "");
  return f.component === "cup" && f.row ? `${label}, ${f.row}` : label;
}

export function photoCaption(f: PlanFinding, view: PhotoView): string {
  const what = (damageCodeInfo(f.damageCode)?.label ?? f.damageCode).toLowerCase();
  const info = COMPONENTS.find((c) => c.code === f.component);
  // "arc burn on the cup", but "seal leaking, outboard" where the damage already names the part.
  const noun = (info?.phrase ?? f.component).replace(/^the (inboard |outboard )?/, "").replace(/s$/, "");
  const names = what.includes(noun) || f.component === "lubricant";
  const where = [
    names ? null : `on ${info?.phrase ?? f.component}`,
    f.component === "cup" && f.row ? `${f.row} row` : names && f.row ? f.row : null,
    f.clockDeg !== null ? `at ${oclock(f.clockDeg)}` : null,
  ].filter(Boolean);
  const head = `${view === "overview" ? "Overview" : "Close-up"}: ${what}${where.length ? (names ? ", " : " ") + where.join(", ") : ""}.`;
  return `${head} ${f.notes}`.trim().slice(0, 500);
}

const MINUTE = 60_000;

const STORIES = new Set(["electrical.arc", "corrosion.moisture", "fatigue.subsurface"]);

/**
 * A close-up of the finding that chose the case, one of the next worst finding, and an overview of
 * the first for the story cases (or where there is nothing else to show): two or three a case.
 */
export function planDemoPhotos(all: readonly PlanCase[], limit = PHOTO_CASES): PlannedPhoto[] {
  return pickPhotoCases(all, limit).flatMap(({ c, lead }) => {
    const damaged = c.findings.filter((f) => f.damageCode !== "none");
    const first = damaged.find((f) => f.damageCode === lead)!;
    const others = damaged
      .filter((f) => f !== first)
      .sort((a, b) => b.severity - a.severity || a.createdAt.getTime() - b.createdAt.getTime())
      .slice(0, 1);
    const shots: [PlanFinding, PhotoView][] = [[first, "close"]];
    if (STORIES.has(lead) || others.length === 0) shots.push([first, "overview"]);
    for (const f of others) shots.push([f, "close"]);
    return shots.map(([f, view], i) => {
      const seed = textSeed(`${c.number}/${i}/${f.component}/${f.damageCode}/${view}`);
      // Taken at the bench shortly before the finding was entered, uploaded a little later.
      const takenAt = new Date(f.createdAt.getTime() - (40 - i * 6) * MINUTE - (seed % 300) * 1000);
      const uploadedAt = new Date(f.createdAt.getTime() + (5 + i) * MINUTE);
      const spec: DemoPhotoSpec = {
        seed,
        caseNumber: c.number,
        component: f.component,
        row: f.row,
        damageCode: f.damageCode,
        zone: f.zone,
        severity: f.severity,
        view,
        partWords: partWords(f),
        takenAt,
      };
      return {
        caseId: c.id,
        caseNumber: c.number,
        spec,
        takenAt,
        uploadedAt,
        fileName: `${c.number.toLowerCase()}-${f.component}-${view}-${i + 1}.jpg`,
        tags: { component: f.component, row: f.row, clockDeg: f.clockDeg, findingId: f.id, caption: photoCaption(f, view) },
      };
    });
  });
}
