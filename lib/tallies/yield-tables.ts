// Each removal-yield figure's numbers as a plain table: the "Table" view and the CSV download.
import type { DataTable } from "./tables";
import type { CallRow, DetectorRow, RateRow, ReadingFit, YieldData } from "./yield-data";

const pct = (x: number | null | undefined) => (x === null || x === undefined ? null : Math.round(x * 1000) / 10);
const money = (x: number) => Math.round(x * 100) / 100;
const unit = (basis: ReadingFit["basis"]) => (basis === "margin" ? "°F over threshold" : "°F reading");

export function readingBinsTable(f: ReadingFit): DataTable {
  return {
    columns: [
      `From (${unit(f.basis)})`,
      "To (below)",
      "Torn down",
      "Confirmed",
      "Confirmed %",
      "95% low %",
      "95% high %",
      "Fitted % at band middle",
    ],
    rows: f.bins.map((b) => {
      const mid = (b.from + b.to) / 2;
      const near = f.fit?.curve.reduce((best, c) => (Math.abs(c.x - mid) < Math.abs(best.x - mid) ? c : best), f.fit.curve[0]);
      return [b.from, b.to, b.n, b.confirmed, pct(b.rate.p), pct(b.rate.lower), pct(b.rate.upper), near ? pct(near.p) : null];
    }),
  };
}

export function rateTable(rows: RateRow[], groupName: string): DataTable {
  return {
    columns: [groupName, "Torn down", "Confirmed", "No defect", "Confirmed %", "95% low %", "95% high %", "Fewer than 10"],
    rows: rows.map((r) => [
      r.label,
      r.n,
      r.confirmed,
      r.noDefect,
      pct(r.rate.p),
      pct(r.rate.lower),
      pct(r.rate.upper),
      r.small ? "yes" : "",
    ]),
  };
}

const POSITION_WORDS: Record<NonNullable<DetectorRow["position"]>, string> = {
  "below-998": "below 99.8% limit",
  "below-95": "below 95% limit",
  inside: "within limits",
  "above-95": "above 95% limit",
  "above-998": "above 99.8% limit",
};

export function detectorTable(d: YieldData["detectors"]): DataTable {
  return {
    columns: [
      "Detector",
      "Location",
      "Trigger",
      "Alarms (any stage)",
      "Torn down",
      "Confirmed",
      "Confirmed %",
      "95% low %",
      "95% high %",
      "Against the fleet",
    ],
    rows: [
      ...d.rows.map((r) => [
        r.label,
        r.location,
        r.trigger,
        r.alarms,
        r.n,
        r.confirmed,
        pct(r.rate.p),
        pct(r.rate.lower),
        pct(r.rate.upper),
        r.position ? POSITION_WORDS[r.position] : "",
      ]),
      ["Fleet", "", "", null, d.fleet.n, d.fleet.confirmed, pct(d.fleet.p), pct(d.fleet.lower), pct(d.fleet.upper), ""],
    ],
  };
}

export const positionWords = (p: DetectorRow["position"]) => (p ? POSITION_WORDS[p] : "no outcomes yet");

export function callTable(rows: CallRow[], groupName: string, window: number): DataTable {
  return {
    columns: [
      groupName,
      "Remove calls torn down",
      "Confirmed",
      "Confirmed %",
      "95% low %",
      "95% high %",
      "Keep calls",
      `Removed again within ${window} days`,
      "Missed %",
    ],
    rows: rows.map((r) => [
      r.label,
      r.n,
      r.confirmed,
      pct(r.rate.p),
      pct(r.rate.lower),
      pct(r.rate.upper),
      r.keeps,
      r.missed,
      r.keeps ? pct(r.missed / r.keeps) : null,
    ]),
  };
}

export function quarterTable(c: YieldData["calls"]): DataTable {
  return {
    columns: ["Shop", ...c.quarterList.flatMap((q) => [`${q} calls`, `${q} confirmed %`])],
    rows: c.quarters.map((s) => [s.label, ...s.points.flatMap((p) => [p.n, pct(p.p)])]),
  };
}

export function costTable(rows: RateRow[], groupName: string): DataTable {
  return {
    columns: [
      groupName,
      "Signed removals with outcome",
      "No defect found",
      "Cost of no-defect removals (USD)",
      "No-defect at sites with no cost set",
    ],
    rows: rows.map((r) => [r.label, r.n, r.noDefect, money(r.costUsd), r.uncosted]),
  };
}
