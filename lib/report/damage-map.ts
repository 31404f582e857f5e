// Where damage sits on the raceways: one ring pair (cup outside, cone inside) per row, 12 o'clock at
// the top, clockwise as seen from the outboard end. Geometry is SVG path text, which both the
// printable page and pdfkit (doc.path) draw.
import type { DamageArc, ReportSourceFinding } from "./types";

/** Arc drawn for a finding with a clock position but no extent: a short mark, not a claim of size. */
export const POINT_ARC_DEG = 8;

const RACEWAY: Record<string, { ring: "cup" | "cone"; row?: "inboard" | "outboard" }> = {
  cup: { ring: "cup" },
  "cone-inboard": { ring: "cone", row: "inboard" },
  "cone-outboard": { ring: "cone", row: "outboard" },
};

/**
 * Arcs for the findings that can be placed: on the cup or a cone, with a clock position. The arc is
 * centred on the clock position. A cup finding with no row is drawn on both rows.
 */
export function damageArcs(findings: readonly ReportSourceFinding[], label: (f: ReportSourceFinding) => string): { arcs: DamageArc[]; offMap: number } {
  const arcs: DamageArc[] = [];
  let offMap = 0;
  for (const f of findings) {
    const place = RACEWAY[f.component];
    if (!place || f.clockDeg === null || f.clockDeg === undefined) {
      offMap++;
      continue;
    }
    const extent = Math.min(360, Math.max(1, f.arcDeg ?? POINT_ARC_DEG));
    const startDeg = f.clockDeg - extent / 2;
    const rows: ("inboard" | "outboard")[] = place.row ? [place.row] : f.row === "inboard" || f.row === "outboard" ? [f.row] : ["inboard", "outboard"];
    for (const row of rows) {
      arcs.push({ ring: place.ring, row, startDeg, endDeg: startDeg + extent, severity: f.severity, label: label(f), estimated: f.arcDeg === null || f.arcDeg === undefined });
    }
  }
  return { arcs, offMap };
}

/** A point on a circle at a clock angle (0° up, clockwise), in screen coordinates (y grows down). */
export function clockPoint(cx: number, cy: number, r: number, deg: number): [number, number] {
  const rad = (deg * Math.PI) / 180;
  return [cx + r * Math.sin(rad), cy - r * Math.cos(rad)];
}

const n = (v: number) => Number(v.toFixed(2));

/** A band between two radii from startDeg to endDeg (clockwise), as a closed SVG path. */
export function bandPath(cx: number, cy: number, rInner: number, rOuter: number, startDeg: number, endDeg: number): string {
  const sweep = Math.min(360, endDeg - startDeg);
  if (sweep >= 359.99) {
    // A full ring: two half circles out, two back in (a single arc cannot close on itself).
    const ring = (r: number, dir: 0 | 1) => {
      const [x0, y0] = clockPoint(cx, cy, r, 0);
      const [x1, y1] = clockPoint(cx, cy, r, 180);
      return `M ${n(x0)} ${n(y0)} A ${r} ${r} 0 1 ${dir} ${n(x1)} ${n(y1)} A ${r} ${r} 0 1 ${dir} ${n(x0)} ${n(y0)} Z`;
    };
    return `${ring(rOuter, 1)} ${ring(rInner, 0)}`;
  }
  const large = sweep > 180 ? 1 : 0;
  const [ox0, oy0] = clockPoint(cx, cy, rOuter, startDeg);
  const [ox1, oy1] = clockPoint(cx, cy, rOuter, startDeg + sweep);
  const [ix1, iy1] = clockPoint(cx, cy, rInner, startDeg + sweep);
  const [ix0, iy0] = clockPoint(cx, cy, rInner, startDeg);
  return [
    `M ${n(ox0)} ${n(oy0)}`,
    `A ${rOuter} ${rOuter} 0 ${large} 1 ${n(ox1)} ${n(oy1)}`,
    `L ${n(ix1)} ${n(iy1)}`,
    `A ${rInner} ${rInner} 0 ${large} 0 ${n(ix0)} ${n(iy0)}`,
    "Z",
  ].join(" ");
}

/** Severity colours (0–4), shared by the page and the PDF: slate, sand, amber, orange, red. */
export const SEVERITY_COLOURS = ["#94a3b8", "#d6b370", "#e29a2d", "#d9601f", "#b91c1c"] as const;

export function severityColour(severity: number): string {
  return SEVERITY_COLOURS[Math.max(0, Math.min(4, Math.round(severity)))];
}

/** Ring radii as fractions of the diagram radius: cup band outside, cone band inside. */
export const RINGS = { cup: [0.74, 0.96], cone: [0.42, 0.64] } as const;
