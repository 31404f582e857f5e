// Damage that takes metal away or pushes it aside: spalls, arc craters, dents, nicks, cracks.
import type { Rng } from "../prng";
import { bandY, spotOn, type Surface } from "./surface";
import { n, polygon, ragged, shrink, specks } from "./svg-kit";

const circle = (x: number, y: number, r: number) =>
  `M${n(x - r)} ${n(y)}a${n(r)} ${n(r)} 0 1 0 ${n(2 * r)} 0a${n(r)} ${n(r)} 0 1 0 ${n(-2 * r)} 0z`;
const uid = (rng: Rng, what: string) => `${what}${rng.int(0, 1e9)}`;

/** Spall: metal flaked out, a deep dark pit with sharp edges, a lit far wall and a broken floor. */
export function spall(rng: Rng, s: Surface, severity: number): string {
  const [cx, cy] = s.kind === "band" ? ((x) => [x, bandY(s, x, rng.real(0.38, 0.62))])(rng.real(420, 780)) : spotOn(rng, s);
  const k = s.scale * (severity >= 4 ? 1.35 : 1);
  const pits = severity >= 4 ? 2 : 1;
  let out = "";
  for (let p = 0; p < pits; p++) {
    const px = cx + p * rng.real(90, 140) * k,
      py = cy + p * rng.real(-30, 30) * k;
    const outline = ragged(rng, px, py, rng.real(95, 150) * k, rng.real(65, 110) * k, rng.int(20, 28), 0.5, rng.real(-0.3, 0.3));
    const id = uid(rng, "spall");
    const box = { x: px - 200 * k, y: py - 160 * k, w: 400 * k, h: 320 * k };
    // The floor sits up and to the left of the rim, so a crescent of lit wall shows at the far side.
    const floor = outline.map(([x, y]) => [x - rng.real(4, 9) * k, y - rng.real(7, 13) * k] as [number, number]);
    const terraces = [...Array(rng.int(4, 7))].map(() => {
      const [fx, fy] = outline[rng.int(0, outline.length - 1)];
      const [ix, iy] = shrink(
        [
          [fx, fy],
          [px, py],
        ],
        0.45,
      )[0];
      const t = ragged(rng, ix, iy, rng.real(14, 34) * k, rng.real(10, 24) * k, 7, 0.6);
      return `<path d="${polygon(t)}" fill="${rng.pick(["#232527", "#2c2f31", "#35383b"])}"/><path d="${polygon(t.map(([x, y]) => [x + 1.5, y + 2] as [number, number]))}" fill="none" stroke="#8f9498" stroke-width="0.9" stroke-opacity="0.6" stroke-dasharray="${n(rng.real(6, 14))} ${n(rng.real(8, 20))}"/>`;
    });
    out += `<clipPath id="${id}"><path d="${polygon(outline)}"/></clipPath>
<radialGradient id="${id}f" cx="0.55" cy="0.45"><stop offset="0" stop-color="#3a3d40"/><stop offset="0.45" stop-color="#222527"/><stop offset="1" stop-color="#0b0c0d"/></radialGradient>
<path d="${polygon(shrink(outline, 1.25))}" fill="#55595d" opacity="0.3" filter="url(#blur6)"/>
<path d="${polygon(outline)}" fill="#8e9397"/>
<g clip-path="url(#${id})"><path d="${polygon(floor)}" fill="url(#${id}f)"/>${terraces.join("")}
${specks(rng, box, 1400, [0.8, 4], ["#4a4e52", "#0a0b0c", "#767b7f"], 0.8)}</g>
<path d="${polygon(outline)}" fill="none" stroke="#070707" stroke-width="1.4"/>
<path d="${polygon(outline.map(([x, y]) => [x + 1.2, y + 1.2] as [number, number]))}" fill="none" stroke="#eef1f3" stroke-width="1" stroke-opacity="0.7" stroke-dasharray="${n(rng.real(10, 30))} ${n(rng.real(10, 40))}"/>
`;
    // Small pits beside the main one, where flaking is about to start.
    for (let i = 0; i < rng.int(2, 5); i++) {
      const a = rng.real(0, Math.PI * 2),
        d = rng.real(110, 170) * k;
      out += `<path d="${polygon(ragged(rng, px + Math.cos(a) * d, py + Math.sin(a) * d * 0.7, rng.real(5, 14) * k, rng.real(4, 10) * k, 9, 0.5))}" fill="#1e2022" stroke="#aeb2b6" stroke-width="0.8"/>`;
    }
  }
  return out;
}

/** Arc burns: small round craters with a re-hardened bright rim and a heat-tinted halo, at roller spacing. */
export function arcBurns(rng: Rng, s: Surface, severity: number): string {
  const spots: [number, number][] = [];
  if (s.kind === "band") {
    const count = rng.int(2, 3 + severity),
      start = rng.real(200, 420);
    for (let i = 0; i < count; i++) {
      const x = start + i * s.pitch * rng.real(0.96, 1.04);
      spots.push([x, bandY(s, x, rng.real(0.35, 0.65))]);
    }
  } else for (let i = 0; i < 3 + severity; i++) spots.push(spotOn(rng, s));
  let halos = "",
    rims = "",
    craters = "",
    drops = "";
  for (const [x, y] of spots) {
    for (let c = 0; c < rng.int(1, 3); c++) {
      const r = rng.real(5, 15) * s.scale * (c === 0 ? 1.3 : 0.7);
      const cx = x + (c === 0 ? 0 : rng.real(-30, 30) * s.scale),
        cy = y + (c === 0 ? 0 : rng.real(-25, 25) * s.scale);
      halos += `<ellipse cx="${n(cx)}" cy="${n(cy)}" rx="${n(r * 2.6)}" ry="${n(r * 2.2)}" fill="url(#burn)"/>`;
      rims += circle(cx, cy, r * 1.15);
      craters += circle(cx + r * 0.12, cy + r * 0.15, r * 0.85);
      for (let d = 0; d < 4; d++) drops += circle(cx + rng.real(-2.4, 2.4) * r, cy + rng.real(-2, 2) * r, rng.real(0.8, 2.2));
    }
  }
  return `<radialGradient id="burn"><stop offset="0.3" stop-color="#6b4a22" stop-opacity="0.7"/><stop offset="0.62" stop-color="#4a5b86" stop-opacity="0.35"/><stop offset="1" stop-color="#b09050" stop-opacity="0"/></radialGradient>
<g filter="url(#blur2)">${halos}</g><path d="${rims}" fill="#d9dde0"/><path d="${craters}" fill="#151515"/><path d="${drops}" fill="#e8ebed" opacity="0.8"/>`;
}

/** True brinelling: dents at roller spacing with metal pushed up at both edges. */
export function brinellDents(rng: Rng, s: Surface, severity: number): string {
  if (s.kind === "disc") return debrisDents(rng, s, severity);
  const start = rng.real(150, 320),
    count = Math.ceil((1000 - start) / s.pitch);
  let out = "";
  for (let i = 0; i < count; i++) {
    const x = start + i * s.pitch + rng.real(-4, 4);
    const t0 = rng.real(0.12, 0.2),
      t1 = rng.real(0.8, 0.88);
    const y0 = bandY(s, x, t0),
      y1 = bandY(s, x, t1),
      w = rng.real(8, 14) * s.scale * (severity >= 4 ? 1.3 : 1);
    out += `<ellipse cx="${n(x)}" cy="${n((y0 + y1) / 2)}" rx="${n(w)}" ry="${n((y1 - y0) / 2)}" fill="url(#dent)"/>
<path d="M${n(x - w - 2)} ${n(y0 + 6)}L${n(x - w - 2)} ${n(y1 - 6)}M${n(x + w + 2)} ${n(y0 + 6)}L${n(x + w + 2)} ${n(y1 - 6)}" stroke="#f3f5f6" stroke-width="1.6" opacity="0.75"/>
<path d="M${n(x - w - 4.5)} ${n(y0 + 8)}L${n(x - w - 4.5)} ${n(y1 - 8)}" stroke="#111" stroke-width="1.2" opacity="0.5"/>`;
  }
  return `<linearGradient id="dent" x1="0" y1="0" x2="1" y2="0"><stop offset="0" stop-color="#2a2c2e" stop-opacity="0.8"/><stop offset="0.5" stop-color="#6d7276" stop-opacity="0.5"/><stop offset="1" stop-color="#eef0f2" stop-opacity="0.7"/></linearGradient>${out}`;
}

/** Debris dents: many small dents with raised rims, some with a frosted halo. */
export function debrisDents(rng: Rng, s: Surface, severity: number): string {
  let dark = "",
    light = "",
    halo = "";
  const count = Math.round((120 + severity * 110) * (s.kind === "band" ? 1 : 0.5));
  for (let i = 0; i < count; i++) {
    const [x, y] = spotOn(rng, s, [0.08, 0.92]);
    const r = rng.real(1.2, rng.chance(0.1) ? 9 : 4.5) * Math.max(0.6, s.scale);
    dark += circle(x, y, r);
    light += circle(x + r * 0.45, y + r * 0.45, r * 0.62);
    if (rng.chance(0.12)) halo += circle(x, y, r * 2.6);
  }
  return `<path d="${halo}" fill="#8d9296" opacity="0.3"/><path d="${dark}" fill="#1f2123" opacity="0.7"/><path d="${light}" fill="#f4f6f7" opacity="0.55"/>`;
}

/** Handling nicks: a few short sharp dents and scratches. */
export function nicks(rng: Rng, s: Surface): string {
  let out = "";
  for (let i = 0; i < rng.int(3, 6); i++) {
    const [x, y] = spotOn(rng, s, [0.05, 0.35]);
    const a = rng.real(-1.2, 1.2),
      len = rng.real(14, 45) * s.scale;
    const dx = Math.cos(a) * len,
      dy = Math.sin(a) * len;
    out += `<path d="M${n(x)} ${n(y)}l${n(dx)} ${n(dy)}" stroke="#141414" stroke-width="${n(rng.real(2, 4))}" stroke-linecap="round"/><path d="M${n(x + 1.5)} ${n(y + 1.5)}l${n(dx)} ${n(dy)}" stroke="#f0f2f3" stroke-width="1" opacity="0.8"/>`;
  }
  return out;
}

/** Cracks: a jagged dark line across the part; fatigue cracks with beach marks, heat checks as a net. */
export function cracks(rng: Rng, s: Surface, kind: "forced" | "fatigue" | "thermal"): string {
  const line = (x: number, y: number, len: number, a: number, steps: number) => {
    const pts: [number, number][] = [[x, y]];
    const heading = a;
    for (let i = 0; i < steps; i++) {
      // Wanders, but keeps to its heading: cracks run across the raceway.
      a += rng.real(-0.45, 0.45) + (heading - a) * 0.35;
      const [px, py] = pts[pts.length - 1];
      pts.push([px + Math.cos(a) * (len / steps), py + Math.sin(a) * (len / steps)]);
    }
    return `M${pts.map(([px, py]) => `${n(px)} ${n(py)}`).join("L")}`;
  };
  const [x, y] = spotOn(rng, s, [0.45, 0.55]);
  const span = s.kind === "band" ? bandY(s, x, 1) - bandY(s, x, 0) : s.outer;
  if (kind === "thermal") {
    let d = "";
    for (let i = 0; i < 40; i++)
      d += line(x + rng.real(-160, 160) * s.scale, y + rng.real(-span / 3, span / 3), rng.real(20, 60) * s.scale, rng.real(0, Math.PI), 4);
    return `<path d="${d}" fill="none" stroke="#161616" stroke-width="1.3" opacity="0.8"/>`;
  }
  const main = line(x, y - span * 0.55, span * 1.15, Math.PI / 2, 14);
  const beach =
    kind === "fatigue"
      ? [...Array(6)]
          .map(
            (_, i) =>
              `<ellipse cx="${n(x)}" cy="${n(y)}" rx="${n((i + 1) * 14 * s.scale)}" ry="${n((i + 1) * 20 * s.scale)}" fill="none" stroke="${i % 2 ? "#55595d" : "#c9cdd0"}" stroke-width="2" opacity="0.35"/>`,
          )
          .join("")
      : `<path d="${polygon(ragged(rng, x, bandYOr(s, x, 0.04), 60 * s.scale, 28 * s.scale, 12, 0.5))}" fill="#2a2b2d"/>`;
  return `${beach}<path d="${main}" fill="none" stroke="#e9ecee" stroke-width="1.4" transform="translate(1.8 1.2)" opacity="0.6"/><path d="${main}" fill="none" stroke="#0a0a0a" stroke-width="${kind === "forced" ? 4.5 : 2.8}"/>`;
}

const bandYOr = (s: Surface, x: number, t: number) => (s.kind === "band" ? bandY(s, x, t) : s.cy - s.outer);
