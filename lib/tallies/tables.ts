// Each chart's numbers as a plain table: the "Table" view on screen and the CSV download.
import { RING_LABELS } from "@/lib/damage-map/look";
import type { Cell } from "./csv";
import { monthLabel } from "./labels";
import type { LifeData } from "./life-data";
import type { TalliesData, ConfirmationTable } from "./types";

export type DataTable = { columns: string[]; rows: Cell[][]; numeric?: boolean[] };

const r3 = (x: number | null | undefined) => (x === null || x === undefined || !Number.isFinite(x) ? null : Math.round(x * 1000) / 1000);
const pct = (x: number | null | undefined) => (x === null || x === undefined ? null : Math.round(x * 1000) / 10);

export function paretoTable(d: TalliesData): DataTable {
  return {
    columns: ["Root cause", "Verdicts", "Share %", "Cumulative %"],
    rows: d.pareto.map((p) => [p.label, p.count, pct(p.share), pct(p.cumulativeShare)]),
  };
}

export function triggerVerdictTable(d: TalliesData): DataTable {
  return {
    columns: ["Trigger", "Confirmed", "No defect", "Outcome not recorded", "Total", "Confirmed %", "95% low %", "95% high %"],
    rows: d.triggerVerdict.map((t) => [
      t.label,
      t.confirmed,
      t.noDefect,
      t.notRecorded,
      t.total,
      pct(t.rate.p),
      pct(t.rate.lower),
      pct(t.rate.upper),
    ]),
  };
}

export function confirmationView(t: ConfirmationTable, groupName: string): DataTable {
  const flag = (s: "below" | "above" | null) => (s === "below" ? "below overall" : s === "above" ? "above overall" : "");
  return {
    columns: [groupName, "Confirmed", "Teardowns", "Confirmed %", "95% low %", "95% high %", "Compared with overall"],
    rows: [
      ...t.rows.map((r) => [r.label, r.confirmed, r.n, pct(r.rate.p), pct(r.rate.lower), pct(r.rate.upper), flag(r.standsOut)]),
      ["All", t.overall.confirmed, t.overall.n, pct(t.overall.p), pct(t.overall.lower), pct(t.overall.upper), ""],
    ],
  };
}

export function monthlyTable(d: TalliesData): DataTable {
  const series = d.monthly.series;
  return {
    columns: ["Month", ...series.flatMap((s) => [s.label, `${s.label}: beyond limits`])],
    rows: d.monthly.months.map((m, i) => [monthLabel(m), ...series.flatMap((s) => [s.counts[i], s.beyond[i] ?? ""])]),
  };
}

export function controlLimitsTable(d: TalliesData): DataTable {
  return {
    columns: ["Series", "Centre (mean per month)", "Lower limit", "Upper limit", "Months beyond"],
    rows: d.monthly.series.map((s) => [s.label, r3(s.centre), r3(s.lowerLimit), r3(s.upperLimit), s.beyond.filter(Boolean).length]),
  };
}

export function causeSiteTable(d: TalliesData): DataTable {
  const c = d.causeSite;
  return {
    columns: ["Site", ...c.causes.flatMap((x) => [x.label, `${x.label}: adjusted residual`])],
    rows: c.sites.map((s, i) => [s.label, ...c.causes.flatMap((_, j) => [c.counts[i][j], r3(c.residuals[i][j])])]),
  };
}

export function clustersTable(d: TalliesData): DataTable {
  return {
    columns: ["Where", "Cause", "Cases", "First removal", "Last removal", "Case numbers"],
    rows: d.clusters.items.map((c) => [c.keyLabel, c.causeLabel, c.size, c.firstDate, c.lastDate, c.caseNumbers.join(" ")]),
  };
}

export function damageTable(d: Pick<TalliesData, "damage">): DataTable {
  const size = d.damage.sectorDeg;
  return {
    columns: ["Raceway", "From (deg)", "To (deg)", "Findings", "Worst severity"],
    rows: d.damage.sectors.map((s) => [RING_LABELS[s.ring], s.sector * size, (s.sector + 1) * size, s.findings, s.maxSeverity]),
  };
}

export function lifeTable(l: LifeData): DataTable {
  return {
    columns: [
      "Root cause",
      "Failures",
      "Suspensions",
      "Shape beta",
      "beta low (Fisher 95%)",
      "beta high (Fisher 95%)",
      "Scale eta",
      "B10",
      "B10 low",
      "B10 high",
      "Reading (from the Fisher bounds)",
      "Longest life",
      "Cautions",
    ],
    rows: l.causes.map((c) => [
      c.label,
      c.failures,
      c.suspensions,
      r3(c.fit?.beta),
      r3(c.fit?.betaBounds[0]),
      r3(c.fit?.betaBounds[1]),
      r3(c.fit?.eta),
      r3(c.fit?.b10),
      r3(c.fit?.b10Bounds[0]),
      r3(c.fit?.b10Bounds[1]),
      c.fit?.shapeReading ?? c.note ?? "",
      r3(c.longestLife),
      c.cautions.map((x) => x.text).join(" "),
    ]),
  };
}

export function probabilityPlotTable(l: LifeData): DataTable {
  const s = l.selected;
  return {
    columns: [`Life (${l.measure})`, "Median rank F", "ln(-ln(1-F))"],
    rows: (s?.plotPoints ?? []).map((p) => [r3(p.time), r3(p.medianRank), r3(p.y)]),
  };
}
