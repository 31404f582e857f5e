// A small invented casebook for tally tests, isolated by a bearing class no one else uses and
// filed at two sites made for the test. The specs are kept so each test can count for itself.
import { randomBytes } from "node:crypto";
import { createCase, siteId } from "../../support/factories";
import { db, t } from "../../support/db";

export type Outcome = "confirmed" | "no-defect" | null;
export type FindingSpec = {
  component: string;
  row: "inboard" | "outboard" | null;
  clockDeg: number | null;
  arcDeg: number | null;
  severity: number;
};
export type CaseSpec = {
  status: "field" | "bench" | "signoff" | "signed";
  trigger: string;
  cause: string | null;
  outcome: Outcome;
  site: "A" | "B" | "MJC";
  removedOn: string;
  car: string;
  lot: string;
  serviceMonths: number | null;
  findings: FindingSpec[];
};
export type Inserted = CaseSpec & { id: string; number: string; siteId: string };

export const TRIGGERS = ["wayside-hot", "hand-roll", "end-play-high", "seal-grease"] as const;
export const CAUSES = ["water-ingress", "seal", "end-of-life", "no-defect", "impact"] as const;
const CARS = ["TSTX 100001", "TSTX 100002", "TSTX 100003", "QQRX 4001", "QQRX 4002"];
const LOTS = ["L-17", "L-18", "L-19", "L-20"];
const PARTS = ["cup", "cone-inboard", "cone-outboard", "rollers-inboard"];

/** A small deterministic generator (Park-Miller), so a failure can be replayed. */
export function rng(seed: number) {
  let s = seed % 2147483647 || 1;
  const next = () => (s = (s * 16807) % 2147483647) / 2147483647;
  return {
    next,
    int: (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1)),
    pick: <T>(xs: readonly T[]) => xs[Math.floor(next() * xs.length)],
  };
}

export const tag = () => `T6${randomBytes(3).toString("hex").toUpperCase()}`;

export function specs(count: number, seed: number, year = 1993): CaseSpec[] {
  const r = rng(seed);
  return Array.from({ length: count }, () => {
    const roll = r.next();
    const status = roll < 0.75 ? "signed" : roll < 0.85 ? "signoff" : roll < 0.93 ? "bench" : "field";
    const cause = status === "signed" ? r.pick(CAUSES) : null;
    const outcome: Outcome = status !== "signed" ? null : cause === "no-defect" ? "no-defect" : r.next() < 0.9 ? "confirmed" : null;
    const month = r.int(1, 12);
    const day = r.int(1, 28);
    return {
      status,
      trigger: r.pick(TRIGGERS),
      cause,
      outcome,
      site: r.next() < 0.55 ? "A" : "B",
      removedOn: `${year}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`,
      car: r.pick(CARS),
      lot: r.pick(LOTS),
      serviceMonths: r.next() < 0.9 ? r.int(3, 240) + r.int(0, 99) / 100 : null,
      findings: Array.from({ length: r.int(0, 3) }, () => ({
        component: r.pick(PARTS),
        row: r.next() < 0.2 ? null : r.next() < 0.5 ? "inboard" : "outboard",
        clockDeg: r.next() < 0.15 ? null : r.int(0, 359),
        arcDeg: r.next() < 0.25 ? null : r.int(5, 120),
        severity: r.int(0, 4),
      })),
    } satisfies CaseSpec;
  });
}

export async function makeSites(code: string): Promise<{ A: string; B: string; MJC: string; names: Record<string, string> }> {
  const rows = await db
    .insert(t.sites)
    .values([
      { code: `${code}A`, name: `Test shop ${code} A`, kind: "car-shop" as const, railway: "Test railway" },
      { code: `${code}B`, name: `Test wheel shop ${code} B`, kind: "wheel-shop" as const, railway: "Test railway" },
    ])
    .returning({ id: t.sites.id, name: t.sites.name });
  const mjc = await siteId("MJC");
  return {
    A: rows[0].id,
    B: rows[1].id,
    MJC: mjc,
    names: { [rows[0].id]: rows[0].name, [rows[1].id]: rows[1].name, [mjc]: "Marrow Junction car shop" },
  };
}

export async function insertCasebook(
  bearingClass: string,
  list: CaseSpec[],
  sites: { A: string; B: string; MJC: string },
): Promise<Inserted[]> {
  const out: Inserted[] = [];
  for (const s of list) {
    const [mark, number] = s.car.split(" ");
    const row = await createCase({
      bearingClass,
      status: s.status,
      trigger: s.trigger,
      primaryCause: s.cause,
      removalConfirmed: s.outcome,
      siteId: sites[s.site],
      removedOn: s.removedOn,
      carMark: mark,
      carNumber: number,
      lot: s.lot,
      serviceMonths: s.serviceMonths,
      findings: s.findings.map((f) => ({ ...f, damageCode: "fatigue.subsurface" })),
    });
    out.push({ ...s, id: row.id, number: row.number, siteId: sites[s.site] });
  }
  return out;
}

/** Counts of `items` grouped by a key, as a plain object. */
export function countBy<T>(items: readonly T[], key: (x: T) => string | null): Record<string, number> {
  const out: Record<string, number> = {};
  for (const x of items) {
    const k = key(x);
    if (k === null) continue;
    out[k] = (out[k] ?? 0) + 1;
  }
  return out;
}

/** Wilson (1927) score interval, written out here independently of lib/stats. */
export function wilson(x: number, n: number, z = 1.959963985): [number, number] {
  const p = x / n;
  const centre = p + (z * z) / (2 * n);
  const half = z * Math.sqrt((p * (1 - p)) / n + (z * z) / (4 * n * n));
  const d = 1 + (z * z) / n;
  return [(centre - half) / d, (centre + half) / d];
}
