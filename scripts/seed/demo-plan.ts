// Expands the demo groups into one planned case each: dates, shops, stages, returns and links.
import type { Stage } from "../../lib/cases/stages";
import { dayBetween } from "./calendar";
import type { CaseSpec, RemovalSite } from "./case-spec";
import { HISTORY_GROUPS, HISTORY_WINDOW, RECENT_GROUPS, RECENT_WINDOW, type Group } from "./demo-groups";
import type { Rng } from "./prng";

/** How many of the newest removals sit in each open stage (the rest are signed). */
export const OPEN_STAGES: readonly (readonly [Stage, number])[] = [
  ["field", 8],
  ["bench", 8],
  ["signoff", 6],
];

function siteFor(rng: Rng, g: Group): RemovalSite {
  if (g.site) return g.site;
  // The wheel shop sees the wheelset removals and the programs; car shops the rest.
  if (g.trigger === "wheel-removal" || g.trigger === "scheduled")
    return rng.weighted([
      ["OSW", 55],
      ["MJC", 25],
      ["PYC", 20],
    ]);
  return rng.weighted([
    ["MJC", 46],
    ["PYC", 36],
    ["OSW", 18],
  ]);
}

function expand(rng: Rng, groups: readonly Group[], window: readonly [string, string], prefix: string): CaseSpec[] {
  const out: CaseSpec[] = [];
  groups.forEach((g, gi) => {
    for (let i = 0; i < g.n; i++) {
      const [from, to] = g.window ?? window;
      const car = g.cars?.[i];
      out.push({
        key: `${prefix}${gi}-${i}`,
        trigger: g.trigger,
        cause: g.cause,
        site: siteFor(rng, g),
        removedOn: dayBetween(rng, from, to),
        status: "signed",
        story: g.story ?? (car ? "repeat-car" : undefined),
        car,
        bearing: g.bearing,
        procedureFault: g.faults?.[i],
        alarmNotConfirmed: g.unconfirmed !== undefined && i < g.unconfirmed,
      });
    }
  });
  return out;
}

export type CaseLinkPlan = { from: string; to: string; note: string };
export type DemoPlan = { specs: CaseSpec[]; links: CaseLinkPlan[] };

export function planDemoCases(rng: Rng): DemoPlan {
  const specs = [...expand(rng, HISTORY_GROUPS, HISTORY_WINDOW, "h"), ...expand(rng, RECENT_GROUPS, RECENT_WINDOW, "r")];
  specs.sort((a, b) => (a.removedOn === b.removedOn ? a.key.localeCompare(b.key) : a.removedOn < b.removedOn ? -1 : 1));

  // The newest removals are still open, newest first in the earliest stage.
  let rank = specs.length - 1;
  for (const [stage, count] of OPEN_STAGES) for (let i = 0; i < count; i++) specs[rank--].status = stage;
  const bench = specs.filter((s) => s.status === "bench");
  bench[Math.floor(bench.length / 2)].returned = true;

  // A few verdicts were sent back once before they were signed, and a couple reopened later.
  const settled = specs.filter((s) => s.status === "signed" && s.removedOn < "2026-07-01");
  for (const s of rng.shuffle(settled.filter((s) => !s.story)).slice(0, 3)) s.returned = true;
  const lot = specs.filter((s) => s.story === "bad-lot");
  lot[0].reopened = true;
  const repeat = settled.filter((s) => s.story === "repeat-car" && !s.returned);
  if (repeat[0]) repeat[0].reopened = true;

  const links: CaseLinkPlan[] = [];
  for (const later of lot.slice(1)) links.push({ from: lot[0].key, to: later.key, note: "Same bearing lot C-2207" });
  const byCar = new Map<string, CaseSpec[]>();
  for (const s of specs) if (s.car) byCar.set(`${s.car.mark} ${s.car.number}`, [...(byCar.get(`${s.car.mark} ${s.car.number}`) ?? []), s]);
  for (const [car, same] of byCar) {
    for (let i = 1; i < same.length; i++) links.push({ from: same[i - 1].key, to: same[i].key, note: `Same car ${car}` });
  }
  const arcs = specs.filter((s) => s.story === "arc-cluster");
  for (const a of arcs.slice(1, 3)) links.push({ from: arcs[0].key, to: a.key, note: "Arc burns after the track 4 welding" });
  return { specs, links };
}
