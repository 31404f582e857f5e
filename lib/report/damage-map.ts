// Where a report's findings sit on the raceways: one ring pair (cup outside, cone inside) per row.
// Drawn by the printable page and the PDF with the shared kit (lib/damage-map/geometry.ts, look.ts).
import { arcOf, ringKindOf } from "@/lib/damage-map/look";
import { ringsOf, type RingId } from "@/lib/damage-map/rings";
import type { DamageArc, ReportSourceFinding } from "./types";

/**
 * Arcs for the findings that can be placed: on the cup or a cone, with a clock position (the same
 * placing rule as the tallies' map, lib/damage-map/rings.ts). A cup finding with no row is drawn on both rows.
 */
export function damageArcs(
  findings: readonly ReportSourceFinding[],
  label: (f: ReportSourceFinding) => string,
): { arcs: DamageArc[]; offMap: number } {
  const arcs: DamageArc[] = [];
  let offMap = 0;
  for (const f of findings) {
    const rings = ringsOf(f.component, f.row);
    if (!rings.length || f.clockDeg === null || f.clockDeg === undefined) {
      offMap++;
      continue;
    }
    const { startDeg, endDeg, estimated } = arcOf(f.clockDeg, f.arcDeg);
    // Inboard first, as the drawing reads left to right.
    for (const ring of [...rings].sort((a, b) => rowOf(a).localeCompare(rowOf(b)))) {
      arcs.push({ ring: ringKindOf(ring), row: rowOf(ring), startDeg, endDeg, severity: f.severity, label: label(f), estimated });
    }
  }
  return { arcs, offMap };
}

const rowOf = (ring: RingId): "inboard" | "outboard" => (ring.endsWith("inboard") ? "inboard" : "outboard");
