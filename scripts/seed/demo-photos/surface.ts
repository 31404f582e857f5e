// Where on a drawn part damage may be laid: a curved band (a raceway or roller body seen close up,
// rolling direction left to right) or a disc (a roller end seen face on).
import type { Rng } from "../prng";
import { n, op } from "./svg-kit";

export type Band = {
  kind: "band";
  x0: number;
  x1: number;
  /** Top edge at x = x0 and centre (x0 + x1) / 2, and bottom edge likewise: a parabola through both. */
  top: readonly [number, number];
  bottom: readonly [number, number];
  /** Roller spacing along the band, in pixels. */
  pitch: number;
  /** 1 for a close-up; smaller when the part is seen from further away. */
  scale: number;
  /** The SVG id of the clip path that keeps marks on the part. */
  clip: string;
  /** How much narrower the band is at x1 than at x0 (a tapered roller), in pixels. */
  taper?: number;
};

export type Disc = { kind: "disc"; cx: number; cy: number; inner: number; outer: number; scale: number; clip: string };

export type Surface = Band | Disc;

export type Scene = { defs: string; body: string; surfaces: Surface[]; over?: string };

/** The y of a band at x, from its top edge (t = 0) to its bottom edge (t = 1). */
export function bandY(b: Band, x: number, t: number): number {
  const mid = (b.x0 + b.x1) / 2,
    half = (b.x1 - b.x0) / 2;
  const u = (x - mid) / half;
  const edge = (e: readonly [number, number]) => e[1] + (e[0] - e[1]) * u * u;
  return edge(b.top) + (edge(b.bottom) - edge(b.top)) * t + (b.taper ?? 0) * u * (0.5 - t) * 0.5;
}

/** Band height at x. */
export const bandHeight = (b: Band, x: number) => bandY(b, x, 1) - bandY(b, x, 0);

/** A path following the band's curve at depth t from x0 to x1 (a quadratic Bézier through its middle). */
export function bandLine(b: Band, t: number, x0 = b.x0, x1 = b.x1): string {
  const mx = (x0 + x1) / 2;
  const y0 = bandY(b, x0, t),
    y1 = bandY(b, x1, t),
    ym = bandY(b, mx, t);
  return `M${n(x0)} ${n(y0)}Q${n(mx)} ${n(2 * ym - (y0 + y1) / 2)} ${n(x1)} ${n(y1)}`;
}

/** The band's outline as a closed path. */
export function bandOutline(b: Band): string {
  const top = bandLine(b, 0);
  const mx = (b.x0 + b.x1) / 2;
  const y1 = bandY(b, b.x1, 1),
    ym = bandY(b, mx, 1),
    y0 = bandY(b, b.x0, 1);
  return `${top}L${n(b.x1)} ${n(y1)}Q${n(mx)} ${n(2 * ym - (y0 + y1) / 2)} ${n(b.x0)} ${n(y0)}Z`;
}

/** Fine grinding marks running round the part: thin lines following the band, light and dark. */
export function grindingLines(rng: Rng, b: Band, perHundredPx: number, strength: number): string {
  const count = Math.round((bandHeight(b, (b.x0 + b.x1) / 2) / 100) * perHundredPx);
  const light: string[] = [],
    dark: string[] = [];
  for (let i = 0; i < count; i++) {
    const t = rng.next();
    const from = b.x0 + (rng.chance(0.3) ? rng.real(0, (b.x1 - b.x0) * 0.6) : 0);
    const to = rng.chance(0.3) ? from + rng.real(150, b.x1 - from) : b.x1;
    (rng.chance(0.5) ? light : dark).push(
      `<path d="${bandLine(b, t, from, Math.min(b.x1, to))}" stroke-width="${n(rng.real(0.5, 1.8))}" stroke-opacity="${op(rng.real(0.15, 1) * strength)}"/>`,
    );
  }
  return `<g fill="none" stroke="#fff">${light.join("")}</g><g fill="none" stroke="#000">${dark.join("")}</g>`;
}

/** A random spot on the surface: x along the band, t across it. */
export function spotOn(rng: Rng, s: Surface, tRange: readonly [number, number] = [0.2, 0.8]): [number, number] {
  if (s.kind === "disc") {
    const a = rng.real(0, Math.PI * 2),
      r = rng.real(s.inner + 10, s.outer - 10);
    return [s.cx + Math.cos(a) * r, s.cy + Math.sin(a) * r];
  }
  const x = rng.real(b0(s), b1(s));
  return [x, bandY(s, x, rng.real(tRange[0], tRange[1]))];
}

const b0 = (b: Band) => b.x0 + (b.x1 - b.x0) * 0.2;
const b1 = (b: Band) => b.x1 - (b.x1 - b.x0) * 0.2;
