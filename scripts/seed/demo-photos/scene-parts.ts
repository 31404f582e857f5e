// Parts whose damage belongs to the part itself: a seal with its lip, the end cap with its cap
// screws and locking plate.
import type { Rng } from "../prng";
import { backdrop, discShadow } from "./backdrop";
import { fretting } from "./damage-stains";
import type { Scene } from "./surface";
import { n, op, polygon, ragged, smoothPath } from "./svg-kit";

const ring = (cx: number, cy: number, r0: number, r1: number) =>
  `M${n(cx - r1)} ${n(cy)}a${n(r1)} ${n(r1)} 0 1 0 ${n(2 * r1)} 0a${n(r1)} ${n(r1)} 0 1 0 ${n(-2 * r1)} 0zM${n(cx - r0)} ${n(cy)}a${n(r0)} ${n(r0)} 0 1 1 ${n(2 * r0)} 0a${n(r0)} ${n(r0)} 0 1 1 ${n(-2 * r0)} 0z`;
const at = (cx: number, cy: number, r: number, a: number): [number, number] => [cx + Math.cos(a) * r, cy + Math.sin(a) * r];

/** A seal face on: stamped casing, black rubber lip, grease at the lip; torn, dented or leaking as found. */
export function sealScene(rng: Rng, code: string, severity: number, view: "close" | "overview"): Scene {
  const k = view === "close" ? rng.real(2.1, 2.5) : 1;
  const cx = rng.real(560, 640),
    cy = view === "close" ? 430 + 280 * k : rng.real(410, 450);
  const R = { outer: 400 * k, casing: 312 * k, lip: 245 * k, bore: 200 * k };
  const painted = rng.chance(0.5);
  const defs = `<radialGradient id="g-casing" cx="${n(0.45)}" cy="${n(0.4)}" r="0.6"><stop offset="0.6" stop-color="${painted ? "#3a3d40" : "#c3c8cc"}"/><stop offset="0.85" stop-color="${painted ? "#1f2123" : "#8e9498"}"/><stop offset="1" stop-color="${painted ? "#2c2e30" : "#aab0b4"}"/></radialGradient>`;
  let ridges = "";
  for (let i = 0; i < 6; i++)
    ridges += `<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(R.casing + (R.outer - R.casing) * rng.real(0.1, 0.95))}" stroke="${i % 2 ? "#fff" : "#000"}" stroke-opacity="0.18" stroke-width="${n(rng.real(1.5, 4) * k)}" fill="none"/>`;
  let body = `${backdrop(rng)}${discShadow(cx + 12, cy + 24, R.outer, 0.5)}
<path d="${ring(cx, cy, R.casing, R.outer)}" fill="url(#g-casing)" fill-rule="evenodd"/>${ridges}
<path d="${ring(cx, cy, R.lip, R.casing)}" fill="#161616" fill-rule="evenodd"/>
${[14, 9, 4].map((w) => `<circle cx="${n(cx)}" cy="${n(cy)}" r="${n((R.lip + R.casing) / 2)}" stroke="#fff" stroke-opacity="0.06" stroke-width="${n(w * k)}" fill="none"/>`).join("")}
<path d="${ring(cx, cy, R.bore, R.lip)}" fill="#a88a4a" fill-rule="evenodd"/>
<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(R.bore)}" fill="#7d8388"/>`;
  const a = -Math.PI / 2 + rng.real(-0.25, 0.25) / k;
  if (code === "seal.damaged") {
    const span = (rng.real(0.08, 0.14) / Math.sqrt(k)) * (1 + severity * 0.3);
    const pts: [number, number][] = [];
    for (let i = 0; i <= 8; i++) pts.push(at(cx, cy, R.lip - 4 + rng.real(-6, 6) * k, a - span / 2 + (span * i) / 8));
    for (let i = 8; i >= 0; i--) pts.push(at(cx, cy, R.lip + (R.casing - R.lip) * rng.real(0.55, 0.9), a - span / 2 + (span * i) / 8));
    const flap = pts.slice(0, 6).map(([x, y]) => [x + 18 * k, y - 10 * k] as [number, number]);
    body += `<path d="${polygon(pts)}" fill="#8d6f38"/><path d="${polygon(flap)}" fill="#2e2e2e" stroke="#555" stroke-width="1.5"/>`;
    // A dent in the casing: a dark crescent with a bright edge.
    const [dx, dy] = at(cx, cy, (R.casing + R.outer) / 2, a + rng.real(0.12, 0.3) / k);
    body += `<ellipse cx="${n(dx)}" cy="${n(dy)}" rx="${n(38 * k)}" ry="${n(18 * k)}" fill="#000" opacity="0.45" filter="url(#blur3)"/><ellipse cx="${n(dx + 4)}" cy="${n(dy + 8)}" rx="${n(34 * k)}" ry="${n(6 * k)}" fill="#fff" opacity="0.35" filter="url(#blur2)"/>`;
  } else if (code === "seal.leaking" || code !== "none") {
    // Grease pushed out past the lip and smeared over the casing.
    let blobs = "",
      gloss = "";
    for (let i = 0; i < 7; i++) {
      const [x, y] = at(cx, cy, rng.real(R.lip, R.outer * 0.98), a + rng.real(-0.22, 0.22) / Math.sqrt(k));
      blobs += `<path d="${smoothPath(ragged(rng, x, y, rng.real(40, 90) * Math.sqrt(k), rng.real(20, 50) * Math.sqrt(k), 9, 0.35, rng.real(-0.5, 0.5)))}"/>`;
      gloss += `<ellipse cx="${n(x - 10)}" cy="${n(y - 8)}" rx="${n(rng.real(6, 16))}" ry="${n(rng.real(3, 7))}"/>`;
    }
    body += `<g fill="#8a6228" opacity="0.92" filter="url(#blur2)">${blobs}</g><g fill="#fff" opacity="0.55" filter="url(#blur2)">${gloss}</g>`;
  }
  return { defs, body, surfaces: [] };
}

/** The end cap face on with its three cap screws and locking plate; loose, backed out or missing as found. */
export function endCapScene(rng: Rng, code: string, plateFinding: boolean): Scene {
  const cx = rng.real(560, 640),
    cy = rng.real(410, 450),
    R = rng.real(370, 400),
    bolt = R * 0.52;
  const turn = rng.real(0, Math.PI * 2);
  let rings = "";
  for (let i = 0; i < 50; i++)
    rings += `<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(rng.real(R * 0.1, R * 0.97))}" stroke="${rng.chance(0.5) ? "#fff" : "#000"}" stroke-opacity="${op(rng.real(0.04, 0.12))}" fill="none"/>`;
  const heads = [0, 1, 2].map((i) => at(cx, cy, bolt, turn + (i * 2 * Math.PI) / 3));
  const plate = polygon(heads.map(([x, y]) => [cx + (x - cx) * 1.45, cy + (y - cy) * 1.45] as [number, number]));
  let body = `${backdrop(rng)}${discShadow(cx + 14, cy + 26, R, 0.55)}
<circle cx="${n(cx)}" cy="${n(cy)}" r="${n(R)}" fill="url(#g-cap)"/><g>${rings}</g>
<path d="${plate}" fill="#6d7377" stroke="#3f4447" stroke-width="6" stroke-linejoin="round"/>`;
  const hex = (x: number, y: number, r: number, rot: number) =>
    polygon([0, 1, 2, 3, 4, 5].map((j) => at(x, y, r, rot + (j * Math.PI) / 3)));
  const loose = code === "mounting.cap-screw" ? rng.int(0, 2) : -1;
  const missing = loose >= 0 && rng.chance(0.4) ? (loose + 1) % 3 : -1;
  heads.forEach(([x, y], i) => {
    const rot = rng.real(0, 1);
    const tab = at(x, y, 70, Math.atan2(y - cy, x - cx));
    body +=
      plateFinding || i === loose
        ? `<rect x="${n(tab[0] - 22)}" y="${n(tab[1] - 14)}" width="44" height="28" fill="#7c8286" stroke="#3f4447" stroke-width="2"/>`
        : `<rect x="${n(tab[0] - 22)}" y="${n(tab[1] - 6)}" width="44" height="12" fill="#b9bec2" stroke="#3f4447" stroke-width="2"/>`;
    if (i === missing) {
      body += `<circle cx="${n(x)}" cy="${n(y)}" r="34" fill="#0d0d0d"/>${[26, 20, 14].map((r) => `<circle cx="${n(x)}" cy="${n(y)}" r="${r}" stroke="#3b3b3b" stroke-width="2" fill="none"/>`).join("")}`;
      body += fretting(rng, { kind: "disc", cx: x, cy: y, inner: 36, outer: 80, scale: 0.5, clip: "" }, 2);
      return;
    }
    const lift = i === loose ? 1.1 : 1;
    body += `<path d="${hex(x + (lift - 1) * 160, y + (lift - 1) * 200, 60 * lift, rot)}" fill="#000" opacity="${i === loose ? 0.6 : 0.45}" filter="url(#blur6)"/>`;
    if (i === loose)
      body += `<circle cx="${n(x)}" cy="${n(y)}" r="40" fill="#9ba0a4"/>${[34, 28, 22].map((r) => `<circle cx="${n(x)}" cy="${n(y)}" r="${r}" stroke="#5d6165" stroke-width="2.5" fill="none"/>`).join("")}`;
    body += `<path d="${hex(x, y - (lift - 1) * 80, 58 * lift, rot)}" fill="url(#g-head)" stroke="#2e3236" stroke-width="2"/><circle cx="${n(x)}" cy="${n(y - (lift - 1) * 80)}" r="${n(44 * lift)}" fill="none" stroke="#fff" stroke-opacity="0.25" stroke-width="2"/>`;
  });
  const defs = `<radialGradient id="g-cap" cx="0.42" cy="0.38" r="0.7"><stop offset="0" stop-color="#9ea3a7"/><stop offset="0.7" stop-color="#62676b"/><stop offset="1" stop-color="#3d4144"/></radialGradient>
<linearGradient id="g-head" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#d2d6d9"/><stop offset="0.5" stop-color="#8d9296"/><stop offset="1" stop-color="#4e5357"/></linearGradient>`;
  return { defs, body, surfaces: [] };
}
