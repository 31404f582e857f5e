// A ring surface seen close up or from a little further: the cup's two raceways, a cone raceway
// under its rib, or a plain ground face (a bore, the cup's outside, the journal).
import type { Rng } from "../prng";
import { backdrop, shadowOf, steelGradient } from "./backdrop";
import { type Band, type Scene, bandLine, bandOutline, bandY, grindingLines } from "./surface";
import { n, op, patina, PHOTO_WIDTH as W } from "./svg-kit";

export type RingKind = "cup" | "cone" | "plain";
export type RingOptions = { kind: RingKind; view: "close" | "overview"; matte: boolean; row: "inboard" | "outboard" | null };

const clipDef = (id: string, b: Band) => `<clipPath id="${id}"><path d="${bandOutline(b)}"/></clipPath>`;

function band(x0: number, x1: number, topMid: number, height: number, sag: number, pitch: number, scale: number, clip: string): Band {
  return { kind: "band", x0, x1, top: [topMid + sag, topMid], bottom: [topMid + height + sag * 1.08, topMid + height], pitch, scale, clip };
}

/** One ground face: gradient, grinding marks, a brighter roller path, dark chamfers at both edges. */
function face(rng: Rng, b: Band, id: string, tone: number, matte: boolean, track: boolean): { defs: string; body: string } {
  const defs = steelGradient(`g-${id}`, rng, tone, matte) + clipDef(b.clip, b);
  const path = bandOutline(b);
  const trackFrom = rng.real(0.14, 0.22),
    trackTo = rng.real(0.78, 0.86);
  // The roller path is polished brighter than the ground finish either side of it.
  const trackLines = track
    ? `<path d="${bandLine(b, (trackFrom + trackTo) / 2)}" stroke="#fff" stroke-opacity="0.16" stroke-width="${n((trackTo - trackFrom) * (b.bottom[1] - b.top[1]))}" fill="none"/>`
    : "";
  // The dim reflection of the camera and whoever holds it.
  const reflection = `<radialGradient id="refl-${id}"><stop offset="0" stop-color="#000" stop-opacity="${op(rng.real(0.1, 0.2))}"/><stop offset="1" stop-color="#000" stop-opacity="0"/></radialGradient>
<ellipse cx="${n(rng.real(b.x0 + 200, b.x1 - 200))}" cy="${n(bandY(b, W / 2, rng.real(0.35, 0.7)))}" rx="${n(rng.real(90, 200))}" ry="${n(rng.real(160, 300) * b.scale)}" fill="url(#refl-${id})"/>`;
  const body = `${shadowOf(path, 22 * b.scale)}<path d="${path}" fill="url(#g-${id})"/>
<g clip-path="url(#${b.clip})">${trackLines}${grindingLines(rng, b, matte ? 50 : 36, matte ? 0.26 : 0.17)}${reflection}
${patina(rng, { x: b.x0, y: Math.min(b.top[1], b.top[0]), w: b.x1 - b.x0, h: b.bottom[0] - b.top[1] }, matte ? 10 : 6, `pat-${id}`)}
<path d="${bandLine(b, 0.012)}" stroke="#0a0a0a" stroke-opacity="0.55" stroke-width="${n(9 * b.scale)}" fill="none"/>
<path d="${bandLine(b, 0.03)}" stroke="#fff" stroke-opacity="0.35" stroke-width="1.4" fill="none"/>
<path d="${bandLine(b, 0.988)}" stroke="#0a0a0a" stroke-opacity="0.6" stroke-width="${n(9 * b.scale)}" fill="none"/></g>`;
  return { defs, body };
}

/** Returns the scene; the first surface is the one the finding is on (the rib, when asked for). */
export function ringScene(rng: Rng, o: RingOptions, onRib: boolean): Scene {
  const tone = rng.real(150, 178);
  const sagClose = rng.real(12, 48),
    x0 = -20,
    x1 = W + 20;
  const parts: { defs: string; body: string }[] = [];
  const surfaces: Band[] = [];

  if (o.view === "close") {
    const top = rng.real(150, 200),
      height = rng.real(470, 540);
    const raceway = band(x0, x1, top, height, sagClose, rng.real(150, 190), 1, "clip-a");
    if (o.kind === "cone") {
      const rib = band(x0, x1, top - rng.real(95, 120), rng.real(70, 85), sagClose * 0.95, raceway.pitch, 1, "clip-rib");
      parts.push(face(rng, rib, "rib", tone * 0.92, true, false));
      surfaces.push(rib);
    }
    parts.push(face(rng, raceway, "a", tone, o.matte, !o.matte));
    surfaces.unshift(raceway);
    if (onRib && surfaces.length > 1) surfaces.reverse();
  } else if (o.kind === "cup") {
    // Both raceways of the one-piece cup, the outboard one nearer the camera (lower in the frame).
    const sag = rng.real(90, 130),
      top = rng.real(200, 240),
      height = rng.real(175, 200);
    const inboard = band(x0, x1, top, height, sag, rng.real(80, 95), 0.5, "clip-a");
    const outboard = band(x0, x1, top + height + rng.real(45, 60), height * 1.08, sag * 1.1, inboard.pitch * 1.08, 0.54, "clip-b");
    parts.push(face(rng, inboard, "a", tone * 0.95, o.matte, !o.matte), face(rng, outboard, "b", tone, o.matte, !o.matte));
    surfaces.push(...(o.row === "inboard" ? [inboard, outboard] : [outboard, inboard]));
  } else {
    const sag = rng.real(90, 130),
      top = rng.real(230, 280),
      height = rng.real(290, 330);
    const raceway = band(x0, x1, top, height, sag, rng.real(85, 100), 0.55, "clip-a");
    if (o.kind === "cone") {
      const rib = band(x0, x1, top - 62, 48, sag * 0.97, raceway.pitch, 0.55, "clip-rib");
      const small = band(x0, x1, top + height + 14, 30, sag * 1.05, raceway.pitch, 0.55, "clip-small");
      parts.push(face(rng, rib, "rib", tone * 0.9, true, false), face(rng, small, "small", tone * 0.88, true, false));
      surfaces.push(rib);
    }
    parts.push(face(rng, raceway, "a", tone, o.matte, !o.matte));
    surfaces.unshift(raceway);
    if (onRib && surfaces.length > 1) surfaces.reverse();
  }
  return {
    defs: parts.map((p) => p.defs).join(""),
    body: backdrop(rng) + parts.map((p) => p.body).join(""),
    surfaces,
  };
}
