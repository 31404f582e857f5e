// The one clock-face kit every damage drawing uses (case page, tallies, printable report, PDF).
// Clock convention (product domain notes): 0° = 12 o'clock, clockwise seen from the outboard end;
// SVG and pdfkit both put y downward, so "up" is a smaller y.
import { describe, expect, it } from "vitest";
import { bandPath, clockPoint, clockWords, HOUR_TICKS } from "@/lib/damage-map/geometry";
import {
  arcOf,
  heatColour,
  offMapWords,
  RING_BANDS,
  SEVERITY_COLOURS,
  SEVERITY_KEYS,
  severityColour,
  severityWord,
} from "@/lib/damage-map/look";
import { SEVERITIES } from "@/lib/classification";

const close = (p: [number, number], q: [number, number]) => {
  expect(p[0]).toBeCloseTo(q[0], 9);
  expect(p[1]).toBeCloseTo(q[1], 9);
};

describe("clockPoint", () => {
  it("puts 12 o'clock at the top, 3 at the right, 6 at the bottom and 9 at the left (arithmetic: sin/cos of 0, 90, 180, 270°)", () => {
    close(clockPoint(100, 100, 50, 0), [100, 50]);
    close(clockPoint(100, 100, 50, 90), [150, 100]);
    close(clockPoint(100, 100, 50, 180), [100, 150]);
    close(clockPoint(100, 100, 50, 270), [50, 100]);
  });

  it("goes clockwise: 1:30 (45°) is up and to the right, on the circle (arithmetic: r·sin45 = r·cos45 = 35.36 for r = 50)", () => {
    close(clockPoint(0, 0, 50, 45), [50 * Math.SQRT1_2, -50 * Math.SQRT1_2]);
    close(clockPoint(0, 0, 50, 360 + 90), clockPoint(0, 0, 50, 90));
  });
});

describe("bandPath", () => {
  it("draws a quarter band as two arcs joined by straight ends (SVG 1.1 path arcs)", () => {
    expect(bandPath(0, 0, 5, 10, 0, 90)).toBe("M 0 -10 A 10 10 0 0 1 10 0 L 5 0 A 5 5 0 0 0 0 -5 Z");
  });

  it("uses the large-arc flag past half a turn and two half circles for a full ring", () => {
    expect(bandPath(0, 0, 5, 10, 0, 270)).toContain("A 10 10 0 1 1");
    expect(bandPath(0, 0, 5, 10, 0, 180)).toContain("A 10 10 0 0 1");
    expect(bandPath(0, 0, 5, 10, 0, 360).match(/A /g)).toHaveLength(4);
  });

  it("still draws a band for a zero-width extent, and crosses 12 o'clock from a negative start", () => {
    expect(bandPath(0, 0, 5, 10, 30, 30)).toMatch(/^M .* Z$/);
    const d = bandPath(0, 0, 5, 10, -30, 30); // 11 o'clock to 1 o'clock over the top
    expect(d.startsWith("M -5 -8.66")).toBe(true); // arithmetic: 10·sin(-30°) = -5, -10·cos(30°) = -8.66
  });

  it("rounds to hundredths so server and browser write the same markup", () => {
    expect(bandPath(0, 0, 5, 10, 0, 10)).not.toMatch(/\d\.\d{3}/);
  });
});

describe("hour ticks and clock words", () => {
  it("has twelve ticks 30° apart with 12, 3, 6 and 9 labelled (a clock face: 360° / 12 hours)", () => {
    expect(HOUR_TICKS.map((t) => t.deg)).toEqual([0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330]);
    expect(HOUR_TICKS.filter((t) => t.major).map((t) => t.label)).toEqual(["12", "3", "6", "9"]);
  });

  it("names clock positions to the nearest half hour, 15° per half hour (arithmetic)", () => {
    expect(clockWords(0)).toBe("12 o'clock (0°)");
    expect(clockWords(60)).toBe("2 o'clock (60°)");
    expect(clockWords(75)).toBe("2:30 (75°)");
    expect(clockWords(90)).toBe("3 o'clock (90°)");
    expect(clockWords(100)).toBe("3:30 (100°)");
    expect(clockWords(350)).toBe("11:30 (350°)");
    expect(clockWords(355)).toBe("12 o'clock (355°)");
    expect(clockWords(-90)).toBe("9 o'clock (270°)");
  });
});

describe("the look shared by screen and PDF", () => {
  it("has one colour and one word per step of the severity scale", () => {
    expect(SEVERITY_COLOURS).toHaveLength(SEVERITIES.length);
    expect(SEVERITY_KEYS).toEqual(["0 none", "1 cosmetic", "2 minor", "3 part condemned", "4 bearing condemned"]);
    expect(severityColour(0)).toBe("#94a3b8");
    expect(severityColour(9)).toBe(severityColour(4));
    expect(severityColour(-1)).toBe(severityColour(0));
    expect(severityWord(3)).toBe("part condemned");
  });

  it("puts the cup band outside the cone band, both inside the drawing radius", () => {
    expect(RING_BANDS.cone[1]).toBeLessThan(RING_BANDS.cup[0]);
    expect(RING_BANDS.cup[1]).toBeLessThanOrEqual(1);
  });

  it("centres an arc on its clock position; no extent is an 8° mark", () => {
    expect(arcOf(90, 30)).toEqual({ startDeg: 75, endDeg: 105, estimated: false });
    expect(arcOf(0, null)).toEqual({ startDeg: -4, endDeg: 4, estimated: true });
    expect(arcOf(10, 500)).toMatchObject({ startDeg: -170, endDeg: 190 });
  });

  it("shades the most-touched sector darkest", () => {
    expect(heatColour(10, 10)).toBe("#b91c1c");
    expect(heatColour(1, 10)).toBe("#fef3c7");
  });

  it("agrees the verb with the count of findings left off", () => {
    expect(offMapWords(1)).toMatch(/^1 finding is not drawn/);
    expect(offMapWords(2)).toMatch(/^2 findings are not drawn/);
    expect(offMapWords(0)).toMatch(/Every finding/);
  });
});
