// Which marks a damage code leaves on a metal surface. Codes that belong to a part of their own
// (seals, grease, cages, fastenings) are drawn by that part's scene instead.
import type { Rng } from "../prng";
import { arcBurns, brinellDents, cracks, debrisDents, nicks, spall } from "./damage-pits";
import { falseBrinell, fluting, fretting, frosting, lapped, smearing, temperColours, waterEtch } from "./damage-stains";
import type { Surface } from "./surface";

type Draw = (rng: Rng, s: Surface, severity: number) => string;

const MARKS: Record<string, Draw> = {
  "fatigue.subsurface": spall,
  "fatigue.surface": frosting,
  "wear.abrasive": (rng, s) => lapped(rng, s),
  "wear.adhesive": smearing,
  "corrosion.moisture": waterEtch,
  "corrosion.fretting": fretting,
  "corrosion.false-brinell": falseBrinell,
  "electrical.arc": arcBurns,
  "electrical.fluting": fluting,
  "deformation.overload": brinellDents,
  "deformation.debris": debrisDents,
  "deformation.handling": (rng, s) => nicks(rng, s),
  "fracture.forced": (rng, s) => cracks(rng, s, "forced"),
  "fracture.fatigue": (rng, s) => cracks(rng, s, "fatigue"),
  "fracture.thermal": (rng, s) => cracks(rng, s, "thermal"),
  "heat.discoloration": temperColours,
  "mounting.fit": (rng, s, sev) => lapped(rng, s) + fretting(rng, s, sev),
  "mounting.backing-ring": fretting,
  // Grease trouble seen on the steel: a dry, dark varnish with heat tint.
  "lubricant.starved": (rng, s, sev) => temperColours(rng, s, Math.max(1, sev - 1)) + smearing(rng, s, 1),
};

/** SVG marks for `code` on the surface, clipped to it; an unknown code or "none" leaves it clean. */
export function surfaceDamage(code: string, rng: Rng, s: Surface, severity: number): string {
  const draw = MARKS[code];
  return draw ? `<g clip-path="url(#${s.clip})">${draw(rng, s, severity)}</g>` : "";
}

export const drawsOnSurface = (code: string) => code in MARKS;
