// The one-dimensional root finders behind the likelihood-ratio bounds and the logistic limits:
// Brent's method must land where bisection does (arithmetic: known roots), in far fewer calls.
import { describe, expect, it } from "vitest";
import { bisectRoot, brentRoot } from "@/lib/stats/solve-1d";

const cases: { name: string; f: (x: number) => number; lo: number; hi: number; root: number }[] = [
  { name: "cos x on [0, 3]", f: Math.cos, lo: 0, hi: 3, root: Math.PI / 2 },
  { name: "x^3 - 2 on [0, 4]", f: (x) => x ** 3 - 2, lo: 0, hi: 4, root: Math.cbrt(2) },
  { name: "e^x - 10 on [-5, 5] (decreasing side first)", f: (x) => 10 - Math.exp(x), lo: -5, hi: 5, root: Math.log(10) },
  { name: "a step-like tanh(50 (x - 0.3)) on [-1, 1]", f: (x) => Math.tanh(50 * (x - 0.3)), lo: -1, hi: 1, root: 0.3 },
];

describe("brentRoot", () => {
  it.each(cases)("finds the root of $name as bisection does, in fewer calls", ({ f, lo, hi, root }) => {
    let brentCalls = 0;
    let bisectCalls = 0;
    const viaBrent = brentRoot((x) => (brentCalls++, f(x)), lo, hi, f(lo), f(hi), 1e-14);
    const viaBisect = bisectRoot((x) => (bisectCalls++, f(x)), lo, hi, 1e-14);
    expect(Math.abs(viaBrent - root)).toBeLessThan(1e-13);
    expect(Math.abs(viaBrent - viaBisect)).toBeLessThan(1e-13);
    expect(brentCalls).toBeLessThan(bisectCalls);
  });

  it("returns an end of the bracket that is already a root", () => {
    expect(brentRoot((x) => x - 2, 2, 5, 0, 3)).toBe(2);
    expect(brentRoot((x) => x - 5, 2, 5, -3, 0)).toBe(5);
  });
});
