// Picks the picture for a finding: which part is shown, how, and what lies beside it.
import type { Rng } from "../prng";
import type { DemoPhotoSpec } from "./draw-photo";
import { steelRule } from "./ruler";
import { cageScene, rollerEndScene, rollersScene } from "./scene-rollers";
import { ringScene } from "./scene-ring";
import { greaseScene } from "./scene-grease";
import { endCapScene, sealScene } from "./scene-parts";
import type { Scene } from "./surface";

const FASTENINGS = new Set(["cap-screws", "locking-plate", "end-cap"]);

function partScene(rng: Rng, spec: DemoPhotoSpec): Scene {
  const { component: c, zone, view, row } = spec;
  if (c === "lubricant")
    return spec.damageCode === "lubricant.starved" ? rollersScene(rng, view, true) : greaseScene(rng, spec.damageCode, view);
  if (c.startsWith("seal")) return sealScene(rng, spec.damageCode, spec.severity, view);
  if (c.startsWith("cage")) return cageScene(rng, spec.damageCode, view);
  if (c.startsWith("rollers")) return zone === "roller-end" ? rollerEndScene(rng) : rollersScene(rng, view, false);
  if (FASTENINGS.has(c)) return endCapScene(rng, spec.damageCode, c === "locking-plate");
  if (c === "cup")
    return ringScene(rng, { kind: zone === "outside-surface" ? "plain" : "cup", view, matte: zone === "outside-surface", row }, false);
  if (c.startsWith("cone"))
    return ringScene(rng, { kind: zone === "bore" ? "plain" : "cone", view, matte: zone === "bore", row }, zone === "rib");
  // The journal, backing ring and spacer: plain ground faces.
  return ringScene(rng, { kind: "plain", view, matte: true, row }, false);
}

/** The scene with a steel rule laid along the bottom of close-ups of metal parts. */
export function sceneFor(rng: Rng, spec: DemoPhotoSpec): Scene {
  const scene = partScene(rng, spec);
  const metal = scene.surfaces.length > 0 && spec.component !== "lubricant";
  if (spec.view === "close" && metal && rng.chance(0.8)) {
    const rule = steelRule(rng, rng.real(30, 560), rng.real(770, 790), rng.real(10, 16), 40);
    return { ...scene, over: (scene.over ?? "") + rule };
  }
  return scene;
}
