// Invented cars, makers and bearings for the demo: our own reporting marks, maker codes and serials.
import type { RootCauseCode } from "../../lib/classification";
import { addDays, DAYS_PER_MONTH, yearMonth } from "./calendar";
import type { Rng } from "./prng";

export const CAR_OWNERS = [
  { mark: "SRRL", weight: 38, digits: 5 },
  { mark: "QVRX", weight: 22, digits: 6 },
  { mark: "TNBX", weight: 18, digits: 4 },
  { mark: "KMLX", weight: 14, digits: 5 },
  { mark: "VEDX", weight: 8, digits: 6 },
] as const;

export const MAKERS = [
  ["MK-A", 34],
  ["MK-B", 24],
  ["MK-C", 20],
  ["MK-D", 14],
  ["MK-E", 8],
] as const;
export const CLASSES = [
  ["F", 44],
  ["K", 18],
  ["E", 14],
  ["G", 16],
  ["D", 4],
  ["other", 4],
] as const;
const OTHER_CLASSES = ["6×11 narrow housing", "5½×10 (older cars)", "7×12 metric cup"];
const WHEEL_DIAMETERS = [
  [36, 55],
  [33, 30],
  [38, 15],
] as const;

export type Car = { mark: string; number: string };

export function pickCar(rng: Rng): Car {
  const owner = rng.weighted(CAR_OWNERS.map((o) => [o, o.weight] as const));
  const lo = 10 ** (owner.digits - 1);
  return { mark: owner.mark, number: String(rng.int(lo, lo * 10 - 1)) };
}

export function pickClass(rng: Rng): { bearingClass: string; bearingClassOther: string | null } {
  const bearingClass = rng.weighted(CLASSES);
  return { bearingClass, bearingClassOther: bearingClass === "other" ? rng.pick(OTHER_CLASSES) : null };
}

export function pickWheelDiameter(rng: Rng): number {
  return rng.weighted(WHEEL_DIAMETERS);
}

/** Months in service before removal, shaped by the cause: wear-out late, workmanship early. */
export function serviceMonthsFor(rng: Rng, cause: RootCauseCode): number {
  const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));
  switch (cause) {
    case "end-of-life":
      return clamp(rng.weibull(3.4, 150), 60, 300);
    case "reconditioning":
    case "mounting":
      return clamp(rng.weibull(0.8, 9), 0.4, 60);
    case "material":
      return clamp(rng.weibull(1.4, 30), 3, 120);
    case "handling":
      return clamp(rng.weibull(1, 14), 0.5, 80);
    case "no-defect":
      return rng.real(4, 200);
    default:
      return clamp(rng.weibull(1.4, 72), 3, 240);
  }
}

export type BearingIdentity = {
  makerCode: string;
  serial: string;
  manufacturedYm: string;
  lot: string | null;
  timesReconditioned: number;
  mountedOn: string;
};

export type BearingOptions = { maker?: string; lot?: string; manufacturedYm?: string; timesReconditioned?: number };

/** A bearing with a history that fits the service time: made, maybe reconditioned, then mounted. */
export function pickBearing(rng: Rng, cause: RootCauseCode, removedOn: string, months: number, opts: BearingOptions = {}): BearingIdentity {
  const mountedOn = addDays(removedOn, -Math.max(1, Math.round(months * DAYS_PER_MONTH)));
  const timesReconditioned =
    opts.timesReconditioned ??
    (cause === "reconditioning"
      ? rng.int(1, 3)
      : cause === "end-of-life"
        ? rng.weighted([
            [0, 70],
            [1, 30],
          ])
        : rng.weighted([
            [0, 55],
            [1, 30],
            [2, 15],
          ]));
  const makerCode = opts.maker ?? rng.weighted(MAKERS);
  const yearsBefore = timesReconditioned * rng.int(6, 10);
  const manufacturedYm = opts.manufacturedYm ?? yearMonth(addDays(mountedOn, -rng.int(20, 540) - yearsBefore * 365));
  const letter = makerCode.slice(-1);
  const yy = manufacturedYm.slice(2, 4);
  const lot = opts.lot ?? (rng.chance(0.65) ? `${letter}-${yy}${String(rng.int(1, 24)).padStart(2, "0")}` : null);
  const serial = `${letter}${yy}-${String(rng.int(0, 99999)).padStart(5, "0")}`;
  return { makerCode, serial, manufacturedYm, lot, timesReconditioned, mountedOn };
}

/** Miles are known for about two cars in three; freight cars run a few thousand miles a month. */
export function serviceMilesFor(rng: Rng, months: number): number | null {
  if (rng.chance(0.32)) return null;
  return Math.round((months * rng.real(2200, 6500)) / 100) * 100;
}
