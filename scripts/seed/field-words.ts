// What the shop writes on a removal: trigger detail, visual findings and a short note.
import type { FieldChecks } from "../../lib/cases/schemas";
import { parseTrials } from "../../lib/field";
import type { CaseSpec } from "./case-spec";
import type { Rng } from "./prng";

type Detail = Record<string, string | number | boolean | null>;
type Visual = FieldChecks["visual"];

const PLACES = ["Crane Hollow", "Tasker Bend", "Millford Siding", "Owl Creek", "Dunmore Flats", "Hessel Cut", "Barrow Point"];
const WHEEL_DEFECTS = [
  "Shelled tread",
  "Slid flat, about 2 in",
  "Thin flange",
  "High flange",
  "Built-up tread",
  "Out of round, thumping",
  "Cracked rim",
];

/** The invented wayside detectors of the demo line; D-217 alarms more often than the others (the demo's over-alarming detector). */
export const DEMO_DETECTORS = [
  { id: "D-104", location: "MP 31.2, Crane Hollow" },
  { id: "D-158", location: "MP 96.7, Tasker Bend" },
  { id: "D-217", location: "MP 142.5, Owl Creek" },
  { id: "D-263", location: "MP 208.1, Hessel Cut" },
  { id: "D-331", location: "MP 377.9, Barrow Point" },
] as const;
export const OVER_ALARMING_DETECTOR = "D-217";

// Four draws as before, so the rest of the demo stays the same. D-217 sends in three of every four no-defect
// alarms and few confirmed ones: on the funnel it sits below the fleet's limits.
function detector(rng: Rng, noDefect: boolean): Detail {
  const a = rng.int(100, 399);
  rng.int(12, 418);
  rng.int(0, 9);
  rng.pick(PLACES);
  const d = noDefect
    ? a % 4 !== 0
      ? DEMO_DETECTORS[2]
      : DEMO_DETECTORS[[0, 1, 3, 4][a % 4]]
    : a % 9 === 0
      ? DEMO_DETECTORS[2]
      : DEMO_DETECTORS[[0, 1, 3, 4][a % 4]];
  return { detectorId: d.id, detectorLocation: d.location };
}

export function visualFor(rng: Rng, spec: CaseSpec): Visual {
  const { trigger, cause } = spec;
  switch (trigger) {
    case "welding":
      return [
        {
          code: "welding-damage",
          note: rng.pick([
            "Arc strike on the cup beside the adapter",
            "Burn marks on the cup OD",
            "Spatter and a burn spot on the end cap",
          ]),
        },
      ];
    case "cap-screws":
      return [{ code: rng.chance(0.7) ? "cap-screw-loose" : "cap-screw-missing" }];
    case "seal-grease":
      return rng.pick([
        [{ code: "seal-damaged" }],
        [{ code: "grease-loss" }],
        [{ code: "seal-damaged" }, { code: "grease-loss" }],
      ] as Visual[]);
    case "backing-ring":
      return [{ code: "backing-ring-loose" }];
    case "visual-other":
      if (cause === "water-ingress") return [{ code: "water", note: "Rusty water weeping at the inboard seal" }];
      if (cause === "lubrication") return [{ code: "heat-discoloration", note: "Blue-brown tint on the cup outboard end" }];
      if (cause === "material") return [{ code: "cup-cracked", note: "Crack across the cup outboard end" }];
      return [{ code: "other", note: rng.pick(["Dark streaks on the cup OD", "Grease smeared over the end cap"]) }];
    default:
      if (cause === "water-ingress" && rng.chance(0.4)) return [{ code: "water" }];
      if (cause === "lubrication" && trigger === "wayside-hot" && rng.chance(0.4)) return [{ code: "heat-discoloration" }];
      return [];
  }
}

function description(spec: CaseSpec): string {
  const map: Partial<Record<string, string>> = {
    "water-ingress": "Water weeping from the inboard seal",
    lubrication: "Heat tint on the cup",
    material: "Cracked cup",
  };
  return map[spec.cause] ?? "Dark streaks on the cup";
}

export function triggerDetailFor(rng: Rng, spec: CaseSpec, seen: { felt?: string; endPlay?: FieldChecks["endPlay"] }): Detail {
  switch (spec.trigger) {
    case "wayside-hot": {
      const thresholdF = rng.chance(0.75) ? 170 : 200;
      // the demo's pattern: the further over the threshold, the likelier teardown confirms the alarm
      const over = spec.cause === "no-defect" ? rng.int(1, 30) : spec.cause === "lubrication" ? rng.int(30, 140) : rng.int(6, 95);
      return { readingF: thresholdF + over, thresholdF, readingBasis: "above-ambient", ...detector(rng, spec.cause === "no-defect") };
    }
    case "wayside-acoustic":
      return { alarmLevel: rng.pick(["level 2", "level 2", "level 3"]), ...detector(rng, spec.cause === "no-defect") };
    case "hand-roll":
      return { felt: seen.felt ?? "roughness" };
    case "end-play-high": {
      const ep = seen.endPlay;
      const values = ep ? parseTrials(ep.method, ep.unit, ep.trials).values : [];
      const mean = values.reduce((s, v) => s + v.in, 0) / Math.max(1, values.length);
      return { endPlayIn: Number(mean.toFixed(4)), method: ep?.method === "tape" ? "tape" : "dial-indicator" };
    }
    case "end-play-tight":
      return { note: "No movement on the dial and it will not turn by hand" };
    case "seal-grease":
      return { side: rng.pick(["inboard", "inboard", "outboard", "both"]) };
    case "welding":
      return {
        note:
          spec.story === "arc-cluster"
            ? "Car had body repair welding on track 4; ground clamp found on the side frame"
            : "Welding done on the car at a contract shop",
      };
    case "cap-screws":
      return { count: rng.int(1, 3) };
    case "backing-ring":
      return { note: "Backing ring moves when tapped" };
    case "wheel-removal":
      return {
        wheelsetDefect:
          spec.cause === "impact" ? rng.pick(WHEEL_DEFECTS.slice(0, 2).concat("Out of round, thumping")) : rng.pick(WHEEL_DEFECTS),
      };
    case "accident":
      return {
        reference: `SRR-IR-${spec.removedOn.slice(2, 4)}-${String(rng.int(3, 60)).padStart(3, "0")}`,
        note: "Car rerailed, wheelsets sent in for inspection",
      };
    case "visual-other":
      return { description: description(spec) };
    case "scheduled":
      return {
        program:
          spec.story === "bad-lot"
            ? "Lot C-2207 withdrawal"
            : rng.pick(["Age limit since mounting", "Wheelset exchange program", "Lab sample program"]),
      };
    default:
      return {
        description: rng.pick([
          "Dropped from the wheelset rack during a shop move",
          "Came back from a contract shop without paperwork",
          "Bearing taken for a lab study",
        ]),
      };
  }
}

const NOTES: Record<string, string[]> = {
  "wayside-hot": [
    "Set out after the detector alarm. Bearing warm to the touch once cooled.",
    "Alarm from the hot-box detector; car set out and brought in.",
    "Set out on the detector; other side of the axle was cool.",
  ],
  "wayside-acoustic": [
    "Acoustic alarm; car brought in at the next terminal.",
    "Flagged by the acoustic site, nothing seen on walk-around.",
  ],
  "hand-roll": [
    "Felt it on the hand roll during the truck job.",
    "Rough spot on hand roll, second revolution.",
    "Found rough during wheel change inspection.",
  ],
  "end-play-high": ["End play over the limit, re-measured to be sure.", "Cup moves too much, measured over the limit."],
  "end-play-tight": ["Zero end play and it will not turn.", "Locked up, no end play."],
  "seal-grease": ["Grease slung on the wheel web.", "Seal lip out of place, grease on the side frame."],
  welding: ["Arc damage seen after welding on the car.", "Burn marks on the cup, see photos."],
  "cap-screws": ["Cap screws loose on the end cap.", "One cap screw gone, locking plate bent."],
  "backing-ring": ["Backing ring loose on the journal.", "Backing ring turns by hand."],
  "wheel-removal": ["Came out with the wheelset for a wheel defect.", "Wheelset removed for tread condition."],
  accident: ["From the rerailed cars, inspected after the incident.", "Car involved in a low-speed derailment."],
  "visual-other": ["Seen on the walk-around.", "Noticed during the car inspection."],
  scheduled: ["Removed under the program, no complaint.", "Scheduled removal."],
  other: ["See the reason given.", "Sent for a look at the lab."],
};

const STORY_NOTES: Record<string, string[]> = {
  "water-run": ["Yard has had standing water for weeks after the spring rains.", "Lots of rain lately; track 2 was under water."],
  "arc-cluster": ["Body welding was done on this car on track 4 last week.", "Welders were on this car for sill repairs."],
  "pellham-hand-roll": ["Cold morning.", "Felt it on the second turn.", "Checked with the new hire."],
};

export function fieldNoteFor(rng: Rng, spec: CaseSpec): string {
  const base = rng.pick(NOTES[spec.trigger] ?? NOTES.other);
  const story = spec.story && STORY_NOTES[spec.story] && rng.chance(0.7) ? ` ${rng.pick(STORY_NOTES[spec.story])}` : "";
  return base + story;
}
