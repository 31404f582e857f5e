// What the parts lie on in the lab: a rubber bench mat, kraft paper or a steel tray, lit from above.
import type { Rng } from "../prng";
import { n, op, PHOTO_HEIGHT as H, PHOTO_WIDTH as W, rgb, specks } from "./svg-kit";

const MATS = [
  { name: "green mat", base: [48, 62, 55] },
  { name: "blue mat", base: [42, 50, 62] },
  { name: "grey mat", base: [58, 58, 60] },
  { name: "kraft paper", base: [140, 112, 80] },
] as const;

const PAPER = { base: [214, 210, 200] } as const;

/** A bench surface filling the frame, with a soft pool of light; `light` picks pale paper. */
export function backdrop(rng: Rng, light = false): string {
  const [r, g, b] = light ? PAPER.base : rng.pick(MATS).base;
  const jitter = rng.real(0.9, 1.1);
  const lx = rng.real(0.3, 0.7),
    ly = rng.real(0.2, 0.5);
  return `<defs><radialGradient id="pool" cx="${n(lx)}" cy="${n(ly)}" r="0.85">
<stop offset="0" stop-color="#fff" stop-opacity="${light ? 0.18 : 0.12}"/><stop offset="1" stop-color="#000" stop-opacity="${light ? 0.18 : 0.3}"/></radialGradient></defs>
<rect width="${W}" height="${H}" fill="${rgb(r * jitter, g * jitter, b * jitter)}"/>
${specks(rng, { x: 0, y: 0, w: W, h: H }, 500, [1, 2.5], light ? ["#b9b3a6", "#ece9e2"] : ["#1d1f20", "#8a8a84"], 0.35)}
<rect width="${W}" height="${H}" fill="url(#pool)"/>`;
}

/**
 * A soft shadow under a part: its outline shifted down with feathered edges. Stacked strokes stand in
 * for a blur filter, which costs far more to render at this size.
 */
export function shadowOf(path: string, dy: number, opacity = 0.55): string {
  const move = `transform="translate(0 ${n(dy)})"`;
  const feather = [40, 24, 10].map(
    (w) =>
      `<path d="${path}" ${move} fill="none" stroke="#000" stroke-width="${w}" stroke-opacity="${op(opacity * 0.25)}" stroke-linejoin="round"/>`,
  );
  return `${feather.join("")}<path d="${path}" ${move} fill="#000" opacity="${op(opacity)}"/>`;
}

/** A round part's shadow: a disc fading out at its rim. */
export const discShadow = (cx: number, cy: number, r: number, opacity = 0.55) =>
  `<radialGradient id="disc-shadow"><stop offset="0.86" stop-color="#000" stop-opacity="${op(opacity)}"/><stop offset="1" stop-color="#000" stop-opacity="0"/></radialGradient>
<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r * 1.1)}" fill="url(#disc-shadow)"/>`;

/** Steel seen on a curved face: a vertical gradient with a bright highlight and dark edges. */
export function steelGradient(id: string, rng: Rng, tone: number, matte = false): string {
  const hl = rng.real(0.22, 0.42);
  const c = (f: number) => rgb(Math.min(255, tone * f - 3), Math.min(255, tone * f), Math.min(255, tone * f + 6));
  const peak = matte ? 1.12 : 1.42;
  const stops: [number, string][] = [
    [0, c(0.42)],
    [0.06, c(0.78)],
    [hl - 0.12, c(0.98)],
    [hl, c(peak)],
    [hl + 0.09, c(1.04)],
    [0.62, c(matte ? 0.9 : 0.8)],
    [0.86, c(matte ? 1.0 : 1.12)],
    [0.95, c(0.75)],
    [1, c(0.4)],
  ];
  return `<linearGradient id="${id}" x1="0" y1="0" x2="0" y2="1">${stops.map(([o, col]) => `<stop offset="${op(o)}" stop-color="${col}"/>`).join("")}</linearGradient>`;
}
