// How every damage drawing names and colours things, so the case page, the tallies, the
// printable report and the PDF say and show the same: ring bands, ring and row names, the
// severity colours and words, the load zone.
import type { RingId } from "./rings";

/** Ring radii as fractions of the drawing's radius: the cup raceway outside, the cone inside. */
export const RING_BANDS = { cup: [0.74, 0.96], cone: [0.42, 0.64] } as const;
export type RingKind = keyof typeof RING_BANDS;

/** The words drawn on each band. */
export const RING_NAMES: Record<RingKind, string> = { cup: "CUP", cone: "CONE" };
export const ROW_NAMES = { inboard: "Inboard row", outboard: "Outboard row" } as const;

/** The four raceways a finding can sit on, as a sentence names them. */
export const RING_LABELS: Record<RingId, string> = {
  "cup-outboard": "Cup, outboard raceway",
  "cup-inboard": "Cup, inboard raceway",
  "cone-outboard": "Outboard cone raceway",
  "cone-inboard": "Inboard cone raceway",
};

export const ringKindOf = (ring: RingId): RingKind => (ring.startsWith("cup") ? "cup" : "cone");

/** Damage without a recorded extent is drawn as a short mark, not a claim of its size. */
export const POINT_ARC_DEG = 8;

/** The load zone drawn on the cup: 60° either side of 12 o'clock, where a loaded journal presses. */
export const LOAD_ZONE_HALF_DEG = 60;
export const LOAD_ZONE_COLOUR = "#f59e0b";
export const LOAD_ZONE_INK = "#b45309";

/** Severity 0–4: slate, sand, amber, orange, red. */
export const SEVERITY_COLOURS = ["#94a3b8", "#d6b370", "#e29a2d", "#d9601f", "#b91c1c"] as const;
/** The legend's short words for the severity scale (its full labels live in the classification). */
export const SEVERITY_WORDS = ["none", "cosmetic", "minor", "part condemned", "bearing condemned"] as const;

const clampSeverity = (s: number) => Math.max(0, Math.min(4, Math.round(s)));
export const severityColour = (severity: number): string => SEVERITY_COLOURS[clampSeverity(severity)];
export const severityWord = (severity: number): string => SEVERITY_WORDS[clampSeverity(severity)];
/** A legend key: "3 part condemned". */
export const SEVERITY_KEYS = SEVERITY_WORDS.map((w, i) => `${i} ${w}`);

/** Heat shades for many cases summed, fewest to most findings. */
export const HEAT_COLOURS = ["#fef3c7", "#fcd34d", "#f59e0b", "#ea580c", "#b91c1c"] as const;
export const heatColour = (findings: number, max: number) =>
  HEAT_COLOURS[Math.min(HEAT_COLOURS.length - 1, Math.floor((findings / Math.max(1, max)) * HEAT_COLOURS.length - 1e-9))];

export const READING_NOTE = "Seen from the outboard end; 12 o'clock at the top, clockwise.";

/** "1 finding is not drawn…" / "2 findings are not drawn…": the verb agrees with the count. */
export function offMapWords(n: number): string {
  if (n === 0) return "Every finding with a clock position is drawn.";
  return n === 1
    ? "1 finding is not drawn: it is off the raceways or has no clock position."
    : `${n} findings are not drawn: they are off the raceways or have no clock position.`;
}

/** The arc a finding takes on the map: centred on its clock position, a short mark when no extent was recorded. */
export function arcOf(clockDeg: number, arcDeg: number | null | undefined): { startDeg: number; endDeg: number; estimated: boolean } {
  const extent = Math.min(360, arcDeg && arcDeg > 0 ? arcDeg : POINT_ARC_DEG);
  const startDeg = clockDeg - extent / 2;
  return { startDeg, endDeg: startDeg + extent, estimated: !arcDeg || arcDeg <= 0 };
}
