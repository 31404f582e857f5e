// Rollers lying on the bench, one roller's large end face on, and rollers held in their cage.
import type { Rng } from "../prng";
import { backdrop, discShadow, shadowOf, steelGradient } from "./backdrop";
import { type Band, type Scene, bandOutline, grindingLines } from "./surface";
import { n, op, PHOTO_WIDTH as W, polygon, ragged, specks } from "./svg-kit";
import { temperColours } from "./damage-stains";

/** Tapered rollers side by side, large ends to the left; `dry` adds the dark varnish of a starved bearing. */
export function rollersScene(rng: Rng, view: "close" | "overview", dry: boolean): Scene {
  const count = view === "close" ? 3 : 5;
  const h = view === "close" ? rng.real(175, 200) : rng.real(105, 120);
  const gap = view === "close" ? rng.real(40, 60) : rng.real(24, 34);
  const left = rng.real(90, 170),
    len = view === "close" ? rng.real(900, 980) : rng.real(760, 860);
  const top0 = (860 - count * h - (count - 1) * gap) / 2;
  let defs = steelGradient("g-roller", rng, rng.real(160, 180));
  defs += `<radialGradient id="g-end" cx="0.4" cy="0.4"><stop offset="0" stop-color="#d9dde0"/><stop offset="0.8" stop-color="#8d9296"/><stop offset="1" stop-color="#4a4e52"/></radialGradient>`;
  let body = backdrop(rng);
  const surfaces: Band[] = [];
  for (let i = 0; i < count; i++) {
    const y = top0 + i * (h + gap) + rng.real(-8, 8);
    const x0 = left + rng.real(-25, 25),
      x1 = x0 + len;
    const b: Band = {
      kind: "band",
      x0,
      x1,
      top: [y, y],
      bottom: [y + h, y + h],
      pitch: h,
      scale: view === "close" ? 1 : 0.6,
      clip: `clip-roller${i}`,
      taper: h * 0.16,
    };
    const outline = bandOutline(b);
    defs += `<clipPath id="${b.clip}"><path d="${outline}"/></clipPath>`;
    body += `${shadowOf(outline, 16)}<path d="${outline}" fill="url(#g-roller)"/><g clip-path="url(#${b.clip})">${grindingLines(rng, b, 30, 0.1)}
${dry ? temperColours(rng, b, 2) + specks(rng, { x: x0, y, w: len, h }, 500, [1, 4], ["#2b1d12", "#4a3020"], 0.6) : ""}</g>
<ellipse cx="${n(x0)}" cy="${n(y + h / 2)}" rx="${n(h * 0.13)}" ry="${n(h * 0.54)}" fill="url(#g-end)"/>
<ellipse cx="${n(x0)}" cy="${n(y + h / 2)}" rx="${n(h * 0.05)}" ry="${n(h * 0.2)}" fill="#5d6165" opacity="0.7"/>`;
    surfaces.push(b);
  }
  // The finding's marks go on one roller chosen at random (marks are drawn on surfaces[0]).
  const pick = rng.int(0, count - 1);
  return { defs, body, surfaces: [surfaces[pick], ...surfaces.filter((_, i) => i !== pick)] };
}

/** One roller's large end face on: ground in rings, a recess in the middle, a chamfered edge. */
export function rollerEndScene(rng: Rng): Scene {
  const cx = rng.real(540, 660),
    cy = rng.real(400, 450),
    r = rng.real(300, 340);
  let rings = "";
  for (let i = 0; i < 90; i++) {
    const rr = rng.real(r * 0.3, r * 0.95);
    rings += `<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(rr)}" stroke="${rng.chance(0.5) ? "#fff" : "#000"}" stroke-opacity="${op(rng.real(0.03, 0.12))}" stroke-width="${n(rng.real(0.6, 1.6))}"/>`;
  }
  const defs = `<radialGradient id="g-face" cx="0.42" cy="0.38" r="0.7"><stop offset="0" stop-color="#e3e6e9"/><stop offset="0.55" stop-color="#a9aeb2"/><stop offset="1" stop-color="#6b7074"/></radialGradient>
<clipPath id="clip-face"><circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r * 0.96)}"/></clipPath>`;
  const body = `${backdrop(rng)}${discShadow(cx + 10, cy + 22, r, 0.5)}
<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r)}" fill="#5b6064"/><circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r * 0.96)}" fill="url(#g-face)"/>
<g fill="none">${rings}</g><circle cx="${n(cx)}" cy="${n(cy)}" r="${n(r * 0.27)}" fill="#6f7478" stroke="#3c4043" stroke-width="3"/>`;
  return { defs, body, surfaces: [{ kind: "disc", cx, cy, inner: r * 0.32, outer: r * 0.95, scale: 1, clip: "clip-face" }] };
}

/** A stretch of stamped steel cage with a roller in each pocket; a bent or broken bar where found. */
export function cageScene(rng: Rng, damageCode: string, view: "close" | "overview"): Scene {
  const top = rng.real(190, 230),
    height = rng.real(420, 470),
    pitch = view === "close" ? rng.real(200, 230) : rng.real(140, 160);
  const win = pitch * 0.62,
    start = rng.real(-60, 0);
  const bad = Math.floor((W / 2 - start) / pitch);
  let defs = steelGradient("g-cage", rng, rng.real(95, 115), true);
  defs += `<linearGradient id="g-pocket-roller" x1="0" y1="0" x2="1" y2="0"><stop offset="0" stop-color="#50555a"/><stop offset="0.35" stop-color="#dfe3e6"/><stop offset="0.7" stop-color="#9da2a6"/><stop offset="1" stop-color="#43474b"/></linearGradient>`;
  let body = `${backdrop(rng)}${shadowOf(`M-10 ${n(top)}h${W + 20}v${n(height)}h${-(W + 20)}z`, 18, 0.5)}
<rect x="-10" y="${n(top)}" width="${W + 20}" height="${n(height)}" fill="url(#g-cage)"/>`;
  for (let i = 0; i * pitch + start < W + pitch; i++) {
    const x = start + i * pitch + (pitch - win) / 2;
    const broken = i === bad && damageCode === "cage.broken",
      bent = i === bad && damageCode === "cage.deformed";
    const skew = bent ? rng.real(14, 24) : 0;
    body += `<rect x="${n(x)}" y="${n(top + 40)}" width="${n(win)}" height="${n(height - 80)}" rx="6" fill="#141516"/>
<rect x="${n(x + 8 + skew)}" y="${n(top + 30)}" width="${n(win - 16)}" height="${n(height - 60)}" rx="14" fill="url(#g-pocket-roller)" transform="rotate(${n(skew / 4)} ${n(x + win / 2)} ${n(top + height / 2)})"/>`;
    if (bent)
      body += `<path d="M${n(x + win)} ${n(top + 20)}Q${n(x + win + 60)} ${n(top + height / 2)} ${n(x + win)} ${n(top + height - 20)}" stroke="#6b7075" stroke-width="${n(pitch - win - 6)}" fill="none"/>`;
    if (broken) {
      const cy = top + rng.real(0.3, 0.7) * height;
      body += `<path d="${polygon(ragged(rng, x + win + (pitch - win) / 2, cy, (pitch - win) * 0.7, 26, 10, 0.6))}" fill="#111"/>
<path d="M${n(x + win - 2)} ${n(top + 40)}v${n(height - 80)}" stroke="#d8dcdf" stroke-width="3" opacity="0.8"/>`;
    }
  }
  return { defs, body, surfaces: [] };
}
