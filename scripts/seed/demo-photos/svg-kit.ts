// Small SVG building blocks for the invented teardown photos: numbers, irregular outlines, specks.
import type { Rng } from "../prng";

export const PHOTO_WIDTH = 1200;
export const PHOTO_HEIGHT = 900;

/** Short, stable number text for SVG attributes. */
export const n = (v: number) => (Math.round(v * 10) / 10).toString();

/** An opacity or gradient offset with two decimals. */
export const op = (v: number) => (Math.round(v * 100) / 100).toString();

export const rgb = (r: number, g: number, b: number) => `rgb(${Math.round(r)},${Math.round(g)},${Math.round(b)})`;

/** A closed path through points given as [x, y] pairs. */
export function polygon(points: readonly (readonly [number, number])[]): string {
  return `M${points.map(([x, y]) => `${n(x)} ${n(y)}`).join("L")}Z`;
}

/**
 * An irregular outline around (cx, cy): a polygon whose radius wanders, for pits, stains and
 * patches. `rough` 0 gives an ellipse, 0.5 a ragged outline with sharp corners.
 */
export function ragged(
  rng: Rng,
  cx: number,
  cy: number,
  rx: number,
  ry: number,
  vertices: number,
  rough: number,
  tilt = 0,
): [number, number][] {
  const out: [number, number][] = [];
  let drift = 1;
  for (let i = 0; i < vertices; i++) {
    const a = (i / vertices) * Math.PI * 2 + rng.real(-0.4, 0.4) / vertices;
    drift = Math.max(0.45, Math.min(1.35, drift + rng.real(-rough, rough) * 0.6));
    const r = drift * (1 - rough * rng.next() * 0.6);
    const x = Math.cos(a) * rx * r,
      y = Math.sin(a) * ry * r;
    out.push([cx + x * Math.cos(tilt) - y * Math.sin(tilt), cy + x * Math.sin(tilt) + y * Math.cos(tilt)]);
  }
  return out;
}

/** The same outline pulled towards its centre by `f` (1 = unchanged). */
export function shrink(points: readonly (readonly [number, number])[], f: number): [number, number][] {
  const cx = points.reduce((s, p) => s + p[0], 0) / points.length;
  const cy = points.reduce((s, p) => s + p[1], 0) / points.length;
  return points.map(([x, y]) => [cx + (x - cx) * f, cy + (y - cy) * f]);
}

/** Many tiny dots inside a box, light and dark: grit, pitting, frosting. One path per colour. */
export function specks(
  rng: Rng,
  box: { x: number; y: number; w: number; h: number },
  count: number,
  size: readonly [number, number],
  colours: readonly string[],
  opacity: number,
): string {
  const paths = colours.map(() => [] as string[]);
  for (let i = 0; i < count; i++) {
    const s = rng.real(size[0], size[1]);
    const x = box.x + rng.next() * box.w,
      y = box.y + rng.next() * box.h;
    paths[rng.int(0, colours.length - 1)].push(`M${n(x)} ${n(y)}h${n(s)}v${n(s * rng.real(0.6, 1.2))}h${n(-s)}z`);
  }
  return paths.map((d, i) => (d.length ? `<path d="${d.join("")}" fill="${colours[i]}" opacity="${opacity}"/>` : "")).join("");
}

/** Blur filters the scenes share, by radius. */
export function blurDefs(radii: readonly number[]): string {
  return radii
    .map((r) => `<filter id="blur${r}" x="-30%" y="-30%" width="160%" height="160%"><feGaussianBlur stdDeviation="${r}"/></filter>`)
    .join("");
}

/** A closed smooth curve through the points (Catmull-Rom turned into cubic Béziers): grease, blobs. */
export function smoothPath(points: readonly (readonly [number, number])[]): string {
  const p = (i: number) => points[(i + points.length) % points.length];
  let d = `M${n(p(0)[0])} ${n(p(0)[1])}`;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = p(i - 1),
      [x1, y1] = p(i),
      [x2, y2] = p(i + 1),
      [x3, y3] = p(i + 2);
    d += `C${n(x1 + (x2 - x0) / 6)} ${n(y1 + (y2 - y0) / 6)} ${n(x2 - (x3 - x1) / 6)} ${n(y2 - (y3 - y1) / 6)} ${n(x2)} ${n(y2)}`;
  }
  return `${d}Z`;
}

/** Faint large stains of use: a used part is never evenly bright. */
export function patina(rng: Rng, box: { x: number; y: number; w: number; h: number }, count: number, id: string): string {
  const tones = ["#6b5a44", "#3d4246", "#9aa0a5"];
  let defs = "",
    out = "";
  tones.forEach(
    (c, i) =>
      (defs += `<radialGradient id="${id}${i}"><stop offset="0" stop-color="${c}" stop-opacity="0.22"/><stop offset="1" stop-color="${c}" stop-opacity="0"/></radialGradient>`),
  );
  for (let i = 0; i < count; i++) {
    out += `<ellipse cx="${n(box.x + rng.next() * box.w)}" cy="${n(box.y + rng.next() * box.h)}" rx="${n(rng.real(60, 260))}" ry="${n(rng.real(30, 120))}" fill="url(#${id}${rng.int(0, tones.length - 1)})" opacity="${op(rng.real(0.4, 1))}"/>`;
  }
  return defs + out;
}
