// Two stories for Tallies › Removal yield, drawn with their own seeded draws so the rest of the demo
// stays as it was: Pellham Yard's remove calls are confirmed at teardown clearly less often than the
// other shops' (hand-roll removals that found nothing), and a few bearings kept in service after a
// wayside alarm came back out of the same car and position weeks later (missed calls). All invented.
import { addDays, dayBetween } from "./calendar";
import { buildCase, type BuiltCase, type SeedContext } from "./case-builder";
import type { CaseSpec, RemovalSite } from "./case-spec";
import { HISTORY_WINDOW } from "./demo-groups";
import type { Rng } from "./prng";

/** Extra Pellham hand-roll removals that teardown did not confirm. */
const WEAK_SHOP_EXTRA = 12;
/** Keep calls followed by a removal of the same car and position, and the days until it. */
const MISSED: readonly {
  site: RemovalSite;
  car: { mark: string; number: string };
  axle: number;
  side: "L" | "R";
  after: number;
  cause: CaseSpec["cause"];
}[] = [
  { site: "PYC", car: { mark: "HRZX", number: "60418" }, axle: 2, side: "R", after: 23, cause: "lubrication" },
  { site: "PYC", car: { mark: "DLWX", number: "3327" }, axle: 3, side: "L", after: 41, cause: "end-of-life" },
  { site: "MJC", car: { mark: "SRLX", number: "88154" }, axle: 1, side: "L", after: 67, cause: "debris-ingress" },
];

export type StoryCase = { spec: CaseSpec; built: BuiltCase };

export function buildYieldStories(rng: Rng, ctx: SeedContext): StoryCase[] {
  const out: StoryCase[] = [];
  for (let i = 0; i < WEAK_SHOP_EXTRA; i++) {
    const spec: CaseSpec = {
      key: `y-weak-${i}`,
      trigger: "hand-roll",
      cause: "no-defect",
      site: "PYC",
      removedOn: dayBetween(rng, ...HISTORY_WINDOW),
      status: "signed",
      story: "pellham-hand-roll",
    };
    out.push(buildUntil(rng, spec, ctx, "remove"));
  }
  MISSED.forEach((m, i) => {
    const keptOn = dayBetween(rng, HISTORY_WINDOW[0], addDays(HISTORY_WINDOW[1], -120));
    const position = { axle: m.axle, side: m.side };
    const kept: CaseSpec = {
      key: `y-kept-${i}`,
      trigger: "wayside-hot",
      cause: "no-defect",
      site: m.site,
      removedOn: keptOn,
      status: "signed",
      car: m.car,
      position,
      alarmNotConfirmed: true,
      story: "missed-call",
    };
    out.push(buildUntil(rng, kept, ctx, "keep"));
    const later: CaseSpec = {
      key: `y-later-${i}`,
      trigger: "hand-roll",
      cause: m.cause,
      site: m.site,
      removedOn: addDays(keptOn, m.after),
      status: "signed",
      car: m.car,
      position,
      story: "missed-call",
    };
    out.push(buildUntil(rng, later, ctx, "remove"));
  });
  return out;
}

/** Draws the case again until its checks give the call the story needs (deterministic for a seed). */
function buildUntil(rng: Rng, spec: CaseSpec, ctx: SeedContext, call: "keep" | "remove"): StoryCase {
  for (let tries = 0; tries < 200; tries++) {
    const built = buildCase(rng, spec, ctx);
    if (built.values.fieldCall === call) return { spec, built };
  }
  throw new Error(`demo story ${spec.key}: no draw gave a ${call} call`);
}
