// Damage that changes the look of the surface more than its shape: etch stains, oxide, frosting,
// fluting, temper colours, smearing and lapping.
import type { Rng } from "../prng";
import { bandLine, bandY, spotOn, type Band, type Surface } from "./surface";
import { n, op, polygon, ragged, specks } from "./svg-kit";

/** A strip across a band at x (the line a roller touches), with ragged edges. */
function acrossStrip(rng: Rng, b: Band, x: number, width: number, t0: number, t1: number): [number, number][] {
  const left: [number, number][] = [],
    right: [number, number][] = [];
  const steps = 12;
  for (let i = 0; i <= steps; i++) {
    const t = t0 + ((t1 - t0) * i) / steps;
    const y = bandY(b, x, t);
    const taper = Math.sin((Math.PI * i) / steps) ** 0.4;
    left.push([x - (width / 2) * taper - rng.real(0, width * 0.35), y]);
    right.unshift([x + (width / 2) * taper + rng.real(0, width * 0.35), y]);
  }
  return [...left, ...right];
}

/** Places along a band at roller spacing, starting somewhere on the left of the frame. */
function rollerSpacing(rng: Rng, b: Band, count: number): number[] {
  const start = rng.real(120, 320);
  return [...Array(count)].map((_, i) => start + i * b.pitch * rng.real(0.97, 1.03)).filter((x) => x < 1150);
}

/** Water etch: brown-black stains at roller spacing, rust halos, etched pits. */
export function waterEtch(rng: Rng, s: Surface, severity: number): string {
  if (s.kind === "disc") return fretting(rng, s, severity);
  let halo = "",
    stain = "",
    pits = "";
  for (const x of rollerSpacing(rng, s, 8)) {
    const strength = rng.real(0.45, 1);
    const w = rng.real(12, 30) * s.scale * (0.7 + severity * 0.2);
    const t0 = rng.real(0.08, 0.25),
      t1 = rng.real(0.75, 0.94);
    halo += `<path d="${polygon(acrossStrip(rng, s, x, w * 2.6, t0, t1))}" opacity="${op(strength * 0.4)}"/>`;
    stain += `<path d="${polygon(acrossStrip(rng, s, x, w, t0 + 0.03, t1 - 0.03))}" fill="${rng.pick(["#24180f", "#3a2616", "#1a1511"])}" opacity="${op(strength * 0.85)}"/>`;
    const y0 = bandY(s, x, t0),
      y1 = bandY(s, x, t1);
    pits += specks(rng, { x: x - w / 2, y: y0, w, h: y1 - y0 }, 40 + severity * 20, [1, 3], ["#0c0907", "#5a3a22"], 0.9);
  }
  // Feathered strokes give the rust halo a soft edge without a costly blur.
  return `<g fill="#7d3f18" stroke="#7d3f18" stroke-linejoin="round" stroke-width="16" stroke-opacity="0.25">${halo}</g><g fill="none" stroke="#7d3f18" stroke-width="34" stroke-opacity="0.08">${halo}</g>${stain}${pits}`;
}

/** Fretting: red-brown oxide in powdery patches. */
export function fretting(rng: Rng, s: Surface, severity: number): string {
  let patches = "",
    powder = "";
  for (let i = 0; i < 3 + severity * 2; i++) {
    const [x, y] = spotOn(rng, s, [0.1, 0.9]);
    const rx = rng.real(40, 130) * s.scale,
      ry = rng.real(20, 70) * s.scale;
    patches += `<path d="${polygon(ragged(rng, x, y, rx, ry, 16, 0.5))}" fill="${rng.pick(["#8e3b1a", "#a4522a", "#6e2e14"])}" opacity="${op(rng.real(0.35, 0.7))}"/>`;
    powder += specks(rng, { x: x - rx, y: y - ry, w: rx * 2, h: ry * 2 }, 120, [1, 2.5], ["#5a210c", "#c0703a"], 0.7);
  }
  return `<g filter="url(#blur2)">${patches}</g>${powder}`;
}

/** False brinelling: shallow bright marks at roller spacing with a faint brown rim, nothing raised. */
export function falseBrinell(rng: Rng, s: Surface, severity: number): string {
  if (s.kind === "disc") return fretting(rng, s, severity);
  let marks = "",
    rims = "";
  for (const x of rollerSpacing(rng, s, 7)) {
    const w = rng.real(5, 10) * s.scale;
    const strip = polygon(acrossStrip(rng, s, x, w, 0.15, 0.85));
    rims += `<path d="${polygon(acrossStrip(rng, s, x, w * 2.8, 0.12, 0.88))}"/>`;
    marks += `<path d="${strip}"/>`;
  }
  return `<g fill="#8a5a2c" opacity="0.35" filter="url(#blur3)">${rims}</g><g fill="#f1f4f6" opacity="0.55">${marks}</g>`;
}

/** Surface distress: frosted grey patches of micro-pits. */
export function frosting(rng: Rng, s: Surface, severity: number): string {
  let patches = "",
    pits = "";
  for (let i = 0; i < 2 + severity; i++) {
    const [x, y] = spotOn(rng, s, [0.3, 0.7]);
    const rx = rng.real(80, 190) * s.scale,
      ry = rng.real(40, 110) * s.scale;
    const id = `frost${rng.int(0, 1e9)}`;
    const outline = polygon(ragged(rng, x, y, rx, ry, 20, 0.35));
    patches += `<path d="${outline}"/>`;
    pits += `<clipPath id="${id}"><path d="${outline}"/></clipPath>
<g clip-path="url(#${id})">${specks(rng, { x: x - rx, y: y - ry, w: rx * 2, h: ry * 2 }, Math.round((rx * ry) / 18), [0.8, 2.2], ["#3f4448", "#e4e7ea"], 0.7)}</g>`;
  }
  return `<g fill="#7f8589" opacity="0.55" filter="url(#blur3)">${patches}</g>${pits}`;
}

/** Fluting: evenly spaced grey bands across the raceway over a dulled stretch, like a washboard. */
export function fluting(rng: Rng, s: Surface, severity: number): string {
  if (s.kind === "disc") return frosting(rng, s, severity);
  const spacing = rng.real(9, 14) * Math.max(0.6, s.scale);
  let dark = "",
    light = "";
  for (let x = rng.real(-10, 40); x < 1220; x += spacing * rng.real(0.95, 1.05)) {
    const t0 = rng.real(0.1, 0.16),
      t1 = rng.real(0.84, 0.9);
    dark += `M${n(x)} ${n(bandY(s, x, t0))}L${n(x)} ${n(bandY(s, x, t1))}`;
    light += `M${n(x + spacing * 0.5)} ${n(bandY(s, x, t0))}L${n(x + spacing * 0.5)} ${n(bandY(s, x, t1))}`;
  }
  return `<path d="${bandLine(s, 0.5)}" stroke="#8e9397" stroke-width="${n((bandY(s, 600, 0.9) - bandY(s, 600, 0.1)) * 0.95)}" opacity="0.45" fill="none"/>
<path d="${dark}" stroke="#474b4f" stroke-width="${n(spacing * 0.42)}" opacity="${op(0.3 + severity * 0.08)}"/>
<path d="${light}" stroke="#dfe3e6" stroke-width="${n(spacing * 0.2)}" opacity="0.25"/>`;
}

/** Heat discoloration: temper colours, straw through brown to blue as the heat rises. */
export function temperColours(rng: Rng, s: Surface, severity: number): string {
  const colours = ["#c9a85e", "#9b6a34", "#6a4a78", "#3f5f9e"].slice(0, Math.min(4, 1 + severity));
  const [x, y] = spotOn(rng, s, [0.4, 0.6]);
  const r = (s.kind === "band" ? rng.real(260, 420) : s.outer) * Math.max(0.7, s.scale);
  // Hottest colour in the middle, fading through the cooler ones to nothing at the rim.
  const stops = [...colours]
    .reverse()
    .map((c, i) => `<stop offset="${op(i / colours.length)}" stop-color="${c}" stop-opacity="0.75"/>`)
    .join("");
  return `<radialGradient id="temper" cx="0.5" cy="0.5" r="0.5">${stops}<stop offset="1" stop-color="${colours[0]}" stop-opacity="0"/></radialGradient>
<ellipse cx="${n(x)}" cy="${n(y)}" rx="${n(r * 1.4)}" ry="${n(r)}" fill="url(#temper)" style="mix-blend-mode:multiply"/>`;
}

/** Smearing and scoring: torn streaks along the rolling direction with a brown tint. */
export function smearing(rng: Rng, s: Surface, severity: number): string {
  let dark = "",
    bright = "";
  const x0 = rng.real(100, 400),
    x1 = x0 + rng.real(400, 700);
  for (let i = 0; i < 30 + severity * 15; i++) {
    const from = rng.real(x0, x1 - 60),
      len = rng.real(40, 260);
    const t = rng.real(0.1, 0.9);
    if (s.kind === "band") {
      const d = bandLine(s, t, from, Math.min(1200, from + len));
      if (rng.chance(0.6)) dark += `<path d="${d}" stroke-width="${n(rng.real(1, 4))}"/>`;
      else bright += `<path d="${d}" stroke-width="${n(rng.real(0.8, 2.4))}"/>`;
    } else {
      const r = rng.real(s.inner, s.outer),
        a0 = rng.real(0, 6.28),
        a1 = a0 + rng.real(0.1, 0.6);
      const p = (a: number) => `${n(s.cx + Math.cos(a) * r)} ${n(s.cy + Math.sin(a) * r)}`;
      dark += `<path d="M${p(a0)}A${n(r)} ${n(r)} 0 0 1 ${p(a1)}" stroke-width="${n(rng.real(1, 4))}"/>`;
    }
  }
  return `${temperColours(rng, s, 1)}<g fill="none" stroke="#3c2f25" opacity="0.7">${dark}</g><g fill="none" stroke="#f5f6f7" opacity="0.7">${bright}</g>`;
}

/** Abrasive wear: the finish lapped dull, fine scratches, a wear step at the edge of the path. */
export function lapped(rng: Rng, s: Surface): string {
  if (s.kind === "disc") return `<circle cx="${n(s.cx)}" cy="${n(s.cy)}" r="${n(s.outer)}" fill="#8f9397" opacity="0.35"/>`;
  let scratches = "";
  for (let i = 0; i < 160; i++) scratches += `<path d="${bandLine(s, rng.real(0.15, 0.85), rng.real(-20, 900), 1220)}"/>`;
  return `<path d="${bandLine(s, 0.5)}" stroke="#8f9397" stroke-width="${n(bandY(s, 600, 0.85) - bandY(s, 600, 0.15))}" opacity="0.4" fill="none"/>
<g fill="none" stroke="#55595c" stroke-width="0.7" opacity="0.35">${scratches}</g>
<path d="${bandLine(s, 0.15)}" stroke="#26292b" stroke-width="2" fill="none" opacity="0.6"/><path d="${bandLine(s, 0.85)}" stroke="#26292b" stroke-width="2" fill="none" opacity="0.6"/>`;
}
