// What teardown finds for each root cause: the parts, damage codes, places and shop notes.
// Drawn so the damage fits the cause (ISO 15243 classifies by appearance; the cause follows from it).
import type { ComponentCode, DamageCode, RootCauseCode, TriggerCode, ZoneCode } from "../../lib/classification";

/** Where on the ring the damage sits: the cup's load zone is at the top, water pools at the bottom. */
export type Place = "load" | "bottom" | "any";

export type Recipe = {
  p: number;
  parts: readonly ComponentCode[];
  damage: DamageCode | readonly DamageCode[];
  sev: readonly [number, number];
  place?: Place;
  arc?: readonly [number, number];
  zone?: ZoneCode;
  /** length lo–hi, width lo–hi in mm */
  size?: readonly [number, number, number, number];
  notes: readonly string[];
};

const CONES = ["cone-inboard", "cone-outboard"] as const;
const ROLLERS = ["rollers-inboard", "rollers-outboard"] as const;
const SEALS = ["seal-inboard", "seal-outboard"] as const;
const CAGES = ["cage-inboard", "cage-outboard"] as const;

const RECIPES: Record<Exclude<RootCauseCode, "electrical" | "mounting">, readonly Recipe[]> = {
  "no-defect": [
    {
      p: 1,
      parts: ["cup"],
      damage: "none",
      sev: [0, 0],
      zone: "raceway",
      notes: [
        "Raceways bright, roller paths even all round.",
        "Cup clean; normal roller path, no marks.",
        "Nothing found on the cup raceways.",
      ],
    },
    { p: 0.7, parts: CONES, damage: "none", sev: [0, 0], zone: "raceway", notes: ["Cone clean.", "Cone raceway and rib fine."] },
    {
      p: 0.3,
      parts: ["cup"],
      damage: "corrosion.fretting",
      sev: [1, 1],
      place: "any",
      arc: [20, 60],
      zone: "outside-surface",
      size: [15, 40, 5, 15],
      notes: ["Light fretting on the cup OD where it sits in the adapter; normal for service."],
    },
    {
      p: 0.2,
      parts: SEALS,
      damage: "none",
      sev: [0, 0],
      zone: "outside-surface",
      notes: ["Seal lip intact, a little grease at the lip, normal."],
    },
  ],
  "end-of-life": [
    {
      p: 1,
      parts: ["cup", "cup", "cup", ...CONES],
      damage: "fatigue.subsurface",
      sev: [3, 4],
      place: "load",
      arc: [15, 70],
      zone: "raceway",
      size: [6, 45, 4, 22],
      notes: [
        "Spalled in the load zone, deep with sharp edges.",
        "Flaking at {oclock}, running along the roller path.",
        "Load zone spall, two pits joined into one.",
        "Spall about the size of a thumbnail, edges still sharp.",
      ],
    },
    {
      p: 0.5,
      parts: CONES,
      damage: "fatigue.surface",
      sev: [2, 2],
      place: "any",
      arc: [40, 160],
      zone: "raceway",
      size: [10, 60, 3, 10],
      notes: ["Frosted grey band along the raceway.", "Micro-pitting, frosted patches."],
    },
    {
      p: 0.4,
      parts: ROLLERS,
      damage: "deformation.debris",
      sev: [2, 2],
      zone: "roller-body",
      size: [5, 20, 2, 8],
      notes: ["Dents from spall flakes rolled over.", "Roller bodies peppered where flakes went through."],
    },
    {
      p: 0.5,
      parts: ["lubricant"],
      damage: "lubricant.degraded",
      sev: [1, 2],
      zone: "other",
      notes: ["Grease dark, metal flakes in it.", "Grease darkened and thick, steel fines throughout."],
    },
  ],
  "water-ingress": [
    {
      p: 1,
      parts: ["cup"],
      damage: "corrosion.moisture",
      sev: [2, 3],
      place: "bottom",
      arc: [30, 110],
      zone: "raceway",
      size: [10, 70, 4, 18],
      notes: [
        "Dark etch at roller spacing along the bottom of the raceway.",
        "Water etch lines at roller pitch, stained black.",
        "Rust stains at roller spacing, etched into the raceway around {oclock}.",
      ],
    },
    {
      p: 1,
      parts: ["lubricant"],
      damage: "lubricant.water",
      sev: [2, 3],
      zone: "other",
      notes: [
        "Grease milky and soft, separates when pressed.",
        "Milky, emulsified grease with free water at the bottom.",
        "Grease grey-white and wet.",
      ],
    },
    {
      p: 0.6,
      parts: SEALS,
      damage: "seal.damaged",
      sev: [2, 2],
      zone: "outside-surface",
      notes: ["Seal lip torn over about a third of the circle.", "Seal casing dented, lip lifted."],
    },
    {
      p: 0.35,
      parts: CONES,
      damage: "corrosion.moisture",
      sev: [2, 2],
      place: "any",
      arc: [20, 80],
      zone: "raceway",
      size: [8, 30, 3, 10],
      notes: ["Stained bands on the cone raceway.", "Rusty marks at roller pitch on the cone."],
    },
    {
      p: 0.3,
      parts: ROLLERS,
      damage: "fatigue.surface",
      sev: [2, 2],
      zone: "roller-body",
      notes: ["Frosted where the etch marks started micro-pitting."],
    },
  ],
  "debris-ingress": [
    {
      p: 1,
      parts: [...CONES, "cup"],
      damage: "deformation.debris",
      sev: [2, 3],
      place: "any",
      arc: [90, 360],
      zone: "raceway",
      size: [20, 120, 5, 20],
      notes: [
        "Many small dents with raised rims all round the raceway.",
        "Peppered with debris dents.",
        "Raceway covered in fine dents, some with frosted halos.",
      ],
    },
    {
      p: 0.85,
      parts: ["lubricant"],
      damage: "lubricant.debris",
      sev: [2, 2],
      zone: "other",
      notes: ["Gritty grease, sand felt between the fingers.", "Grease full of fine grit and a few larger chips."],
    },
    {
      p: 0.5,
      parts: ROLLERS,
      damage: "wear.abrasive",
      sev: [2, 2],
      zone: "roller-body",
      notes: ["Rollers dull and lapped.", "Lapped finish on the rollers, wear step at the ends."],
    },
    { p: 0.3, parts: SEALS, damage: "seal.damaged", sev: [1, 2], zone: "outside-surface", notes: ["Seal lip worn thin, let grit in."] },
  ],
  lubrication: [
    {
      p: 1,
      parts: ["lubricant"],
      damage: ["lubricant.starved", "lubricant.degraded"],
      sev: [3, 3],
      zone: "other",
      notes: ["Very little grease left, what is left is dark and hard.", "Dry rollers, grease burnt to a crust."],
    },
    {
      p: 0.8,
      parts: CONES,
      damage: "heat.discoloration",
      sev: [3, 4],
      zone: "rib",
      notes: ["Blue temper colour on the rib face.", "Brown to blue heat tint on the cone rib and large roller ends."],
    },
    {
      p: 0.7,
      parts: ROLLERS,
      damage: "wear.adhesive",
      sev: [3, 3],
      zone: "roller-end",
      notes: ["Roller ends scored and smeared.", "Smearing on the large ends of the rollers."],
    },
    { p: 0.25, parts: CAGES, damage: "cage.broken", sev: [3, 3], zone: "other", notes: ["Cage pockets worn through at two places."] },
  ],
  seal: [
    {
      p: 1,
      parts: SEALS,
      damage: ["seal.damaged", "seal.leaking"],
      sev: [2, 3],
      zone: "outside-surface",
      notes: ["Seal lip torn, grease purged past it.", "Seal casing pushed in and cocked.", "Seal leaking, lip hardened and cracked."],
    },
    {
      p: 0.5,
      parts: ["lubricant"],
      damage: ["lubricant.debris", "lubricant.water"],
      sev: [1, 2],
      zone: "other",
      notes: ["Some grit in the grease near the seal.", "Grease a little milky on the seal side."],
    },
    {
      p: 0.4,
      parts: CONES,
      damage: "deformation.debris",
      sev: [2, 2],
      place: "any",
      arc: [40, 200],
      zone: "raceway",
      notes: ["Scattered debris dents near the seal side."],
    },
  ],
  impact: [
    {
      p: 1,
      parts: ["cup"],
      damage: "deformation.overload",
      sev: [3, 4],
      place: "load",
      arc: [20, 80],
      zone: "raceway",
      size: [3, 12, 2, 8],
      notes: ["Dents at roller spacing with displaced metal at the edges.", "True brinell marks in the load zone, one per roller."],
    },
    {
      p: 0.6,
      parts: CONES,
      damage: "deformation.overload",
      sev: [3, 3],
      place: "any",
      arc: [10, 40],
      zone: "raceway",
      notes: ["Matching dents on the cone."],
    },
    { p: 0.25, parts: CAGES, damage: "cage.deformed", sev: [3, 3], zone: "other", notes: ["Cage bent at two bars."] },
  ],
  handling: [
    {
      p: 1,
      parts: ["cup"],
      damage: "corrosion.false-brinell",
      sev: [2, 3],
      place: "load",
      arc: [40, 100],
      zone: "raceway",
      size: [2, 6, 1, 3],
      notes: ["Shallow marks at roller spacing, no raised metal.", "Standstill marks at roller pitch, bright bottoms."],
    },
    { p: 0.4, parts: CONES, damage: "deformation.handling", sev: [1, 2], zone: "rib", notes: ["Nicks on the cone rib, looks dropped."] },
    { p: 0.3, parts: SEALS, damage: "seal.damaged", sev: [2, 2], zone: "outside-surface", notes: ["Seal casing dented from a knock."] },
  ],
  reconditioning: [
    {
      p: 1,
      parts: CONES,
      damage: "wear.adhesive",
      sev: [3, 3],
      zone: "rib",
      notes: ["Rib face scored, rollers ran hard against it.", "Smeared rib, looks like the setting was too tight."],
    },
    { p: 0.5, parts: CAGES, damage: "cage.deformed", sev: [2, 3], zone: "other", notes: ["Cage pocket bent, assembly damage."] },
    { p: 0.4, parts: ROLLERS, damage: "fatigue.surface", sev: [2, 2], zone: "roller-body", notes: ["Frosted roller bodies."] },
  ],
  material: [
    {
      p: 1,
      parts: ["cup", "cup", ...CONES],
      damage: "fatigue.subsurface",
      sev: [4, 4],
      place: "load",
      arc: [10, 40],
      zone: "raceway",
      size: [4, 20, 3, 12],
      notes: ["Early spall starting at a stringer under the surface.", "Spall with a dark inclusion line at its bottom."],
    },
    {
      p: 0.45,
      parts: ["cup"],
      damage: "fracture.fatigue",
      sev: [4, 4],
      place: "load",
      arc: [2, 8],
      zone: "raceway",
      size: [20, 90, 1, 2],
      notes: ["Crack with beach marks running across the raceway."],
    },
    { p: 0.4, parts: ROLLERS, damage: "deformation.debris", sev: [2, 2], zone: "roller-body", notes: ["Dents from the spall flakes."] },
  ],
  undetermined: [
    {
      p: 1,
      parts: CONES,
      damage: "fatigue.surface",
      sev: [1, 2],
      place: "any",
      arc: [20, 90],
      zone: "raceway",
      notes: ["Faint frosting, could be early surface distress or cleaning marks."],
    },
    { p: 0.5, parts: ["lubricant"], damage: "lubricant.degraded", sev: [1, 1], zone: "other", notes: ["Grease darker than usual."] },
    {
      p: 0.4,
      parts: ["cup"],
      damage: "heat.discoloration",
      sev: [1, 1],
      place: "any",
      arc: [30, 90],
      zone: "raceway",
      notes: ["Faint straw tint near the outboard end."],
    },
  ],
};

const ARC_BURNS: readonly Recipe[] = [
  {
    p: 1,
    parts: ["cup"],
    damage: "electrical.arc",
    sev: [3, 4],
    place: "any",
    arc: [3, 15],
    zone: "raceway",
    size: [1, 6, 1, 5],
    notes: [
      "Row of small fused craters at roller spacing.",
      "Arc burn crater with a re-hardened rim.",
      "Weld burns on the raceway, fused spots at {oclock}.",
    ],
  },
  {
    p: 0.7,
    parts: ROLLERS,
    damage: "electrical.arc",
    sev: [3, 3],
    zone: "roller-body",
    size: [1, 4, 1, 3],
    notes: ["Burn spots on three rollers.", "Small craters on several rollers."],
  },
  { p: 0.4, parts: ["lubricant"], damage: "lubricant.degraded", sev: [1, 1], zone: "other", notes: ["Grease darkened next to the burns."] },
];
const FLUTING: readonly Recipe[] = [
  {
    p: 1,
    parts: ["cup", ...CONES],
    damage: "electrical.fluting",
    sev: [2, 3],
    place: "any",
    arc: [180, 360],
    zone: "raceway",
    notes: ["Evenly spaced grey bands across the raceway, washboard look."],
  },
  { p: 0.5, parts: ["lubricant"], damage: "lubricant.degraded", sev: [2, 2], zone: "other", notes: ["Grease blackened."] },
];
const LOOSE_SCREWS: readonly Recipe[] = [
  {
    p: 1,
    parts: ["cap-screws"],
    damage: "mounting.cap-screw",
    sev: [3, 3],
    zone: "other",
    notes: ["Two cap screws backed out, threads fretted.", "One cap screw broken off, the others loose."],
  },
  {
    p: 0.5,
    parts: ["locking-plate"],
    damage: "mounting.cap-screw",
    sev: [2, 2],
    zone: "other",
    notes: ["Locking plate tabs never bent up."],
  },
];
const LOOSE_RING: readonly Recipe[] = [
  {
    p: 1,
    parts: ["backing-ring"],
    damage: "mounting.backing-ring",
    sev: [3, 3],
    zone: "bore",
    notes: ["Backing ring loose, fretted where it meets the fillet."],
  },
  {
    p: 0.5,
    parts: ["journal"],
    damage: "corrosion.fretting",
    sev: [2, 2],
    place: "any",
    arc: [60, 200],
    zone: "outside-surface",
    notes: ["Fretting on the journal fillet."],
  },
];
const LOOSE_CONE: readonly Recipe[] = [
  {
    p: 1,
    parts: CONES,
    damage: "mounting.fit",
    sev: [3, 3],
    place: "any",
    arc: [120, 360],
    zone: "bore",
    notes: ["Cone bore polished, creep marks all round.", "Cone loose on the journal, bore fretted red-brown."],
  },
  {
    p: 0.6,
    parts: ["journal"],
    damage: "corrosion.fretting",
    sev: [2, 2],
    place: "any",
    arc: [60, 200],
    zone: "outside-surface",
    notes: ["Red-brown fretting on the journal under the cone."],
  },
  { p: 0.3, parts: ["cap-screws"], damage: "mounting.cap-screw", sev: [2, 2], zone: "other", notes: ["Cap screws under torque."] },
];

export function recipesFor(cause: RootCauseCode, trigger: TriggerCode): readonly Recipe[] {
  if (cause === "electrical") return trigger === "welding" || trigger === "visual-other" ? ARC_BURNS : FLUTING;
  if (cause === "mounting") return trigger === "cap-screws" ? LOOSE_SCREWS : trigger === "backing-ring" ? LOOSE_RING : LOOSE_CONE;
  const base = RECIPES[cause];
  if (cause === "material" && trigger === "visual-other") return base.map((r) => (r.damage === "fracture.fatigue" ? { ...r, p: 1 } : r));
  if (cause === "impact" && trigger === "accident") {
    return [
      ...base,
      { p: 0.5, parts: CONES, damage: "fracture.forced", sev: [4, 4], zone: "rib", notes: ["Cone cracked through at the large rib."] },
    ];
  }
  return base;
}
