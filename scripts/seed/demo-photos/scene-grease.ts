// A grease sample spread on lab paper beside the putty knife it was taken with: amber when sound,
// milky with droplets when wet, gritty, or dark and crusted when broken down.
import type { Rng } from "../prng";
import { backdrop, shadowOf } from "./backdrop";
import type { Scene } from "./surface";
import { n, op, polygon, ragged, smoothPath, specks } from "./svg-kit";

const GREASE: Record<string, { fill: string; specks: string[]; gloss: number }> = {
  "lubricant.water": { fill: "#d6cdb6", specks: ["#f4f1ea", "#9f9580"], gloss: 0.7 },
  "lubricant.debris": { fill: "#7b5a2c", specks: ["#1c1a18", "#d9dcdf", "#3b2f22"], gloss: 0.45 },
  "lubricant.degraded": { fill: "#3a2a1a", specks: ["#1a120b", "#5b4128"], gloss: 0.3 },
  normal: { fill: "#b48535", specks: ["#9a6e28", "#d0a050"], gloss: 0.6 },
};

export function greaseScene(rng: Rng, code: string, view: "close" | "overview"): Scene {
  const g = GREASE[code] ?? GREASE.normal;
  const k = view === "close" ? 1 : 0.62;
  const cx = rng.real(520, 680),
    cy = rng.real(380, 460);
  const outline = ragged(rng, cx, cy, 360 * k, 230 * k, 14, 0.3, rng.real(-0.3, 0.3));
  const shape = smoothPath(outline);
  const box = { x: cx - 380 * k, y: cy - 250 * k, w: 760 * k, h: 500 * k };

  // Knife strokes leave ridges across the sample: darker troughs, lighter crests.
  let ridges = "";
  for (let i = 0; i < 18; i++) {
    const y = cy + rng.real(-240, 240) * k;
    ridges += `<path d="M${n(cx - 420 * k)} ${n(y)}Q${n(cx)} ${n(y + rng.real(-40, 40) * k)} ${n(cx + 420 * k)} ${n(y + rng.real(-30, 30))}" stroke="${i % 2 ? "#000" : "#fff"}" stroke-opacity="${op(rng.real(0.05, 0.14))}" stroke-width="${n(rng.real(4, 14) * k)}"/>`;
  }
  let gloss = "";
  for (let i = 0; i < 14; i++) {
    const [x, y] = outline[rng.int(0, outline.length - 1)];
    const px = cx + (x - cx) * rng.real(0.1, 0.8),
      py = cy + (y - cy) * rng.real(0.1, 0.8);
    gloss += `<path d="${smoothPath(ragged(rng, px, py, rng.real(20, 70) * k, rng.real(6, 18) * k, 8, 0.4, rng.real(-0.4, 0.4)))}" opacity="${op(rng.real(0.3, 0.8))}"/>`;
  }
  let extra = "";
  if (code === "lubricant.water") {
    // Free water standing in droplets on the emulsion.
    for (let i = 0; i < 26; i++) {
      const x = cx + rng.real(-300, 300) * k,
        y = cy + rng.real(-180, 180) * k,
        r = rng.real(4, 16) * k;
      extra += `<circle cx="${n(x)}" cy="${n(y)}" r="${n(r)}" fill="#bcb5a3" stroke="#8e8776" stroke-width="1.2"/><circle cx="${n(x - r * 0.3)}" cy="${n(y - r * 0.35)}" r="${n(r * 0.3)}" fill="#fff" opacity="0.9"/>`;
    }
  } else if (code === "lubricant.degraded") {
    for (let i = 0; i < 12; i++) {
      extra += `<path d="${polygon(ragged(rng, cx + rng.real(-280, 280) * k, cy + rng.real(-160, 160) * k, rng.real(15, 40) * k, rng.real(10, 30) * k, 9, 0.6))}" fill="#1d140c" stroke="#6d5236" stroke-width="1.2"/>`;
    }
  }
  const grit = specks(rng, box, code === "lubricant.debris" ? 2600 : 1200, [1, code === "lubricant.debris" ? 4 : 3], g.specks, 0.75);
  const kx = rng.real(760, 860),
    ky = rng.real(560, 640);
  const knife = `<g transform="rotate(${n(rng.real(-25, -10))} ${n(kx)} ${n(ky)})"><rect x="${n(kx + 4)}" y="${n(ky + 12)}" width="420" height="90" rx="8" fill="#000" opacity="0.25" filter="url(#blur6)"/>
<rect x="${n(kx)}" y="${n(ky)}" width="240" height="90" rx="6" fill="url(#g-knife)"/><rect x="${n(kx + 230)}" y="${n(ky + 25)}" width="190" height="40" rx="10" fill="#2b3a55"/></g>`;

  const defs = `<clipPath id="clip-grease"><path d="${shape}"/></clipPath>
<radialGradient id="g-grease-body" cx="0.45" cy="0.4" r="0.6"><stop offset="0" stop-color="#fff" stop-opacity="0.18"/><stop offset="0.75" stop-color="#000" stop-opacity="0"/><stop offset="1" stop-color="#000" stop-opacity="0.35"/></radialGradient>
<linearGradient id="g-knife" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#e5e8ea"/><stop offset="1" stop-color="#8f9498"/></linearGradient>`;
  const body = `${backdrop(rng, true)}${shadowOf(shape, 8, 0.3)}<path d="${shape}" fill="${g.fill}"/><path d="${shape}" fill="url(#g-grease-body)"/>
<g clip-path="url(#clip-grease)">${grit}<g fill="none">${ridges}</g><g fill="#fff" opacity="${op(g.gloss)}" filter="url(#blur3)">${gloss}</g>${extra}</g>${knife}`;
  return { defs, body, surfaces: [] };
}
