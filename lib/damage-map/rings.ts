// Where a finding sits on the raceways: which ring (cup or cone, inboard or outboard row) and which
// clock sectors its arc covers. Clock degrees: 0 = 12 o'clock, clockwise seen from the outboard end;
// the clock position is the middle of the damage and the arc its whole extent.

export const RINGS = ["cup-outboard", "cup-inboard", "cone-outboard", "cone-inboard"] as const;
export type RingId = (typeof RINGS)[number];

export type PlaceableFinding = {
  component: string;
  row?: string | null;
  clockDeg?: number | null;
  arcDeg?: number | null;
  severity: number;
  damageCode?: string;
};

/** The raceway rings a finding belongs to; a cup finding without a row is drawn on both cup raceways. */
export function ringsOf(component: string, row?: string | null): RingId[] {
  if (component === "cup") {
    if (row === "inboard") return ["cup-inboard"];
    if (row === "outboard") return ["cup-outboard"];
    return ["cup-outboard", "cup-inboard"];
  }
  if (component === "cone-inboard") return ["cone-inboard"];
  if (component === "cone-outboard") return ["cone-outboard"];
  return [];
}

const mod = (a: number, n: number) => ((a % n) + n) % n;

/**
 * First sector index (before wrapping) and how many sectors damage centred at `clockDeg`
 * spanning `arcDeg` touches; sector k covers [k*size, (k+1)*size) degrees. No arc means a
 * spot: the one sector holding the clock position. The SQL in db/queries/tallies follows this rule.
 */
export function sectorSpan(clockDeg: number, arcDeg: number | null | undefined, sectorDeg = 10): { first: number; count: number } {
  const n = Math.round(360 / sectorDeg);
  if (!arcDeg || arcDeg <= 0) return { first: Math.floor(clockDeg / sectorDeg), count: 1 };
  if (arcDeg >= 360) return { first: 0, count: n };
  const first = Math.floor((2 * clockDeg - arcDeg) / (2 * sectorDeg));
  const last = Math.ceil((2 * clockDeg + arcDeg) / (2 * sectorDeg)) - 1;
  return { first, count: Math.min(n, last - first + 1) };
}

/** The sector indices (0 .. 360/size - 1) a span covers, wrapping past 12 o'clock. */
export function spanSectors(first: number, count: number, sectorDeg = 10): number[] {
  const n = Math.round(360 / sectorDeg);
  const out = new Set<number>();
  for (let k = first; k < first + count; k++) out.add(mod(k, n));
  return [...out].sort((a, b) => a - b);
}

export function sectorsCovered(clockDeg: number, arcDeg: number | null | undefined, sectorDeg = 10): number[] {
  const { first, count } = sectorSpan(clockDeg, arcDeg, sectorDeg);
  return spanSectors(first, count, sectorDeg);
}

/** A group of findings on one ring with one severity and one span, as counted by the database. */
export type SpanGroup = { ring: RingId; severity: number; first: number; count: number; findings: number };

/** Sums span groups into sectors: findings touching each sector and the worst severity there. */
export function sumSpanGroups(groups: readonly SpanGroup[], sectorDeg = 10): SectorCell[] {
  const cells = new Map<string, SectorCell>();
  for (const g of groups) {
    for (const sector of spanSectors(g.first, g.count, sectorDeg)) {
      const key = `${g.ring}:${sector}`;
      const cell = cells.get(key) ?? { ring: g.ring, sector, findings: 0, maxSeverity: 0 };
      cell.findings += g.findings;
      cell.maxSeverity = Math.max(cell.maxSeverity, g.severity);
      cells.set(key, cell);
    }
  }
  return [...cells.values()].sort((a, b) => RINGS.indexOf(a.ring) - RINGS.indexOf(b.ring) || a.sector - b.sector);
}

export type SectorCell = { ring: RingId; sector: number; findings: number; maxSeverity: number };

/** Places one case's findings (or any list) on the rings; findings off the raceways or without a clock position are counted aside. */
export function binFindings(
  findings: readonly PlaceableFinding[],
  sectorDeg = 10,
): { sectors: SectorCell[]; placed: number; unplaced: number } {
  const groups: SpanGroup[] = [];
  let placed = 0;
  let unplaced = 0;
  for (const f of findings) {
    const rings = ringsOf(f.component, f.row);
    if (rings.length === 0 || f.clockDeg === null || f.clockDeg === undefined) {
      unplaced++;
      continue;
    }
    placed++;
    const span = sectorSpan(f.clockDeg, f.arcDeg, sectorDeg);
    for (const ring of rings) groups.push({ ring, severity: f.severity, ...span, findings: 1 });
  }
  return { sectors: sumSpanGroups(groups, sectorDeg), placed, unplaced };
}
