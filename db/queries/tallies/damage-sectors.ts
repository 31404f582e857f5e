// Findings on the raceways of the filtered cases (cup and cones, with a clock position), counted
// in PostgreSQL by part, row, severity and clock span (the rule of sectorSpan in lib/damage-map/rings.ts), then spread over sectors.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { ringsOf, sumSpanGroups, type SpanGroup } from "@/lib/damage-map/rings";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { DamageTally } from "@/lib/tallies/types";
import { tallyWhere, type TallyViewer } from "./scope";

type SpanRow = { part: string; row: string | null; severity: number; first: number; count: number; findings: number };

// Same predicate as the partial index findings_raceway_idx, so the planner can use it.
const PLACEABLE = sql.raw(`f.clock_deg is not null and f.component in ('cup', 'cone-inboard', 'cone-outboard')`);

export async function damageSectors(filters: TallyFilters, viewer: TallyViewer, sectorDeg = 10): Promise<DamageTally> {
  const n = Math.round(360 / sectorDeg);
  const N = sql.raw(String(n));
  const S = sql.raw(String(sectorDeg));
  const S2 = sql.raw(String(2 * sectorDeg));
  // Whole-number arithmetic only (cheap per row): floor(x / 2S) for x >= -360 is (x + 720) / 2S - n
  // in integer division, and ceil(y / 2S) for y >= 0 is (y + 2S - 1) / 2S.
  const first = sql.raw(`(2 * f.clock_deg - coalesce(f.arc_deg, 0) + 720) / ${2 * sectorDeg} - ${n}`);
  const { rows } = await db.execute<SpanRow>(sql`
    select f.component as part, f.row, max(f.severity)::int as severity,
      case when coalesce(f.arc_deg, 0) <= 0 then f.clock_deg / ${S}
           when f.arc_deg >= 360 then 0
           else ${first} end as first,
      case when coalesce(f.arc_deg, 0) <= 0 then 1
           when f.arc_deg >= 360 then ${N}
           else least(${N}, (2 * f.clock_deg + f.arc_deg + ${S2} - 1) / ${S2} - (${first})) end as count,
      count(*)::int as findings
    from findings f
    where ${PLACEABLE} and f.case_id in (select ${cases.id} from ${cases} where ${tallyWhere(filters, viewer, { signedOnly: true })})
    group by 1, 2, 4, 5`);
  let placed = 0;
  const groups: SpanGroup[] = [];
  for (const r of rows) {
    placed += r.findings;
    for (const ring of ringsOf(r.part, r.row))
      groups.push({ ring, severity: r.severity, first: r.first, count: r.count, findings: r.findings });
  }
  return { sectorDeg, sectors: sumSpanGroups(groups, sectorDeg), placed };
}
