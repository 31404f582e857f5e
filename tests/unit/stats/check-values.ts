// Loads the stored reference values and compares numbers the way the file defines:
// rel_tol = |got - expected| / |expected|; abs_tol for rounded published figures.
import { readFileSync } from "node:fs";
import path from "node:path";
import { expect } from "vitest";

const fixturePath = path.resolve(import.meta.dirname, "../../fixtures/stats-check-values.json");

// eslint-disable-next-line @typescript-eslint/no-explicit-any
export const checkValues: any = JSON.parse(readFileSync(fixturePath, "utf8"));

export function expectRel(got: number, expected: number, relTol: number): void {
  if (expected === 0) {
    expect(Math.abs(got)).toBeLessThanOrEqual(relTol);
    return;
  }
  const rel = Math.abs(got - expected) / Math.abs(expected);
  expect(rel, `got ${got}, expected ${expected} (rel ${rel.toExponential(2)} > ${relTol})`).toBeLessThanOrEqual(relTol);
}

export function expectAbs(got: number, expected: number, absTol: number): void {
  const diff = Math.abs(got - expected);
  expect(diff, `got ${got}, expected ${expected} (diff ${diff.toExponential(2)} > ${absTol})`).toBeLessThanOrEqual(absTol);
}

export function unitsOf(set: { times: number[]; status: number[] }): { time: number; failed: boolean }[] {
  return set.times.map((time, i) => ({ time, failed: set.status[i] === 1 }));
}
