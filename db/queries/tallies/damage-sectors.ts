// Findings on the raceways of the filtered cases, counted in PostgreSQL by part, row, severity
// and clock span (the rule of sectorSpan in lib/damage-map/rings.ts), then spread over sectors.
import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db";
import { cases } from "@/db/schema";
import { ringsOf, sumSpanGroups, type SpanGroup } from "@/lib/damage-map/rings";
import type { TallyFilters } from "@/lib/tallies/filters";
import type { DamageTally } from "@/lib/tallies/types";
import { tallyWhere, type TallyViewer } from "./scope";

type SpanRow = { part: string | null; row: string | null; severity: number; first: number | null; count: number | null; findings: number };

export async function damageSectors(filters: TallyFilters, viewer: TallyViewer, sectorDeg = 10): Promise<DamageTally> {
  const n = Math.round(360 / sectorDeg);
  const N = sql.raw(String(n));
  const S = sql.raw(`${sectorDeg}.0`);
  const S2 = sql.raw(`${2 * sectorDeg}.0`);
  const filtered = sql`select ${cases.id} from ${cases} where ${tallyWhere(filters, viewer, { signedOnly: true })}`;
  const spans = db.execute<SpanRow>(sql`
    select case when f.component in ('cup', 'cone-inboard', 'cone-outboard') and f.clock_deg is not null then f.component end as part,
      f.row, f.severity,
      case when f.clock_deg is null then null
           when coalesce(f.arc_deg, 0) <= 0 then floor(f.clock_deg / ${S})::int
           when f.arc_deg >= 360 then 0
           else floor((2 * f.clock_deg - f.arc_deg) / ${S2})::int end as first,
      case when f.clock_deg is null then null
           when coalesce(f.arc_deg, 0) <= 0 then 1
           when f.arc_deg >= 360 then ${N}
           else least(${N}, ceil((2 * f.clock_deg + f.arc_deg) / ${S2})::int - floor((2 * f.clock_deg - f.arc_deg) / ${S2})::int) end as count,
      count(*)::int as findings
    from findings f
    where f.case_id in (${filtered})
    group by 1, 2, 3, 4, 5`);
  const caseCount = db.execute<{ cases: number }>(sql`select count(distinct f.case_id)::int as cases from findings f where f.case_id in (${filtered})`);
  const [spanRows, counted] = await Promise.all([spans, caseCount]);

  let placed = 0;
  let unplaced = 0;
  const groups: SpanGroup[] = [];
  for (const r of spanRows.rows) {
    if (r.part === null || r.first === null || r.count === null) {
      unplaced += r.findings;
      continue;
    }
    placed += r.findings;
    for (const ring of ringsOf(r.part, r.row)) groups.push({ ring, severity: r.severity, first: r.first, count: r.count, findings: r.findings });
  }
  return { sectorDeg, sectors: sumSpanGroups(groups, sectorDeg), placed, unplaced, cases: counted.rows[0]?.cases ?? 0 };
}
