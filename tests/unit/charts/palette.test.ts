import { describe, expect, it } from "vitest";
import { CAUSE_COLOURS } from "@/components/charts/palette";

// sRGB → CIELAB (D65), IEC 61966-2-1 and CIE 15 formulas (arithmetic)
function lab(hex: string): [number, number, number] {
  const [r, g, b] = [1, 3, 5].map((i) => {
    const c = parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  const x = (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047;
  const y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
  const z = (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883;
  const f = (t: number) => (t > 216 / 24389 ? Math.cbrt(t) : ((24389 / 27) * t + 16) / 116);
  return [116 * f(y) - 16, 500 * (f(x) - f(y)), 200 * (f(y) - f(z))];
}
const dE = (a: string, b: string) => Math.hypot(...lab(a).map((v, i) => v - lab(b)[i]));

describe("root-cause colours", () => {
  it("are thirteen different colours, every pair clearly apart (CIE76 ΔE ≥ 20)", () => {
    const list = Object.entries(CAUSE_COLOURS);
    expect(new Set(list.map(([, c]) => c.toLowerCase())).size).toBe(list.length);
    for (let i = 0; i < list.length; i++)
      for (let j = i + 1; j < list.length; j++)
        expect(dE(list[i][1], list[j][1]), `${list[i][0]} vs ${list[j][0]}`).toBeGreaterThanOrEqual(20);
  });
});

describe("image legend layout", () => {
  it("never lets two entries overlap, wrapping long ones to a new row (arithmetic)", async () => {
    const { layoutLegend } = await import("@/components/charts/export-image");
    const widths = [120, 200, 90, 260, 60];
    const at = layoutLegend(widths, 400);
    expect(at).toEqual([
      { x: 0, row: 0 },
      { x: 136, row: 0 },
      { x: 0, row: 1 },
      { x: 106, row: 1 },
      { x: 0, row: 2 },
    ]);
    for (let i = 1; i < at.length; i++)
      if (at[i].row === at[i - 1].row) expect(at[i].x).toBeGreaterThanOrEqual(at[i - 1].x + widths[i - 1]);
  });
});
