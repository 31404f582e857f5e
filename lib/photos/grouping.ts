// How the case page orders photos: by part, in the order a bearing is taken apart, untagged last.
import { COMPONENTS } from "@/lib/classification/bearing-parts";
import { clockWords } from "@/lib/damage-map/geometry";
import { componentLabel as labelOfComponent, damageLabel } from "@/lib/classification/labels";

export const UNTAGGED = "untagged";

export type PhotoGroup<P> = { code: string; label: string; photos: P[] };

const ORDER = new Map<string, number>(COMPONENTS.map((c, i) => [c.code, i]));

export function componentLabel(code: string | null | undefined): string {
  if (!code) return "Not tagged to a part";
  return labelOfComponent(code);
}

export function groupByComponent<P extends { component: string | null; takenAt: string | null; createdAt: string }>(
  photos: P[],
): PhotoGroup<P>[] {
  const groups = new Map<string, P[]>();
  for (const p of photos) {
    const key = p.component ?? UNTAGGED;
    groups.set(key, [...(groups.get(key) ?? []), p]);
  }
  const rank = (code: string) => (code === UNTAGGED ? Number.MAX_SAFE_INTEGER : (ORDER.get(code) ?? ORDER.size));
  const when = (p: P) => p.takenAt ?? p.createdAt;
  return [...groups.entries()]
    .sort(([a], [b]) => rank(a) - rank(b) || a.localeCompare(b))
    .map(([code, list]) => ({
      code,
      label: code === UNTAGGED ? "Not tagged to a part yet" : componentLabel(code),
      photos: [...list].sort((x, y) => when(x).localeCompare(when(y))),
    }));
}

/** Photos in the order the grid shows them, for stepping through in the lightbox. */
export function displayOrder<P extends { component: string | null; takenAt: string | null; createdAt: string }>(photos: P[]): P[] {
  return groupByComponent(photos).flatMap((g) => g.photos);
}

type FindingLike = { id: string; component: string; row: string | null; damageCode: string; severity: number; clockDeg: number | null };

/** "Cup · Subsurface spall · severity 3 · 3 o'clock (90°)": how a finding is named in the photo tags. */
export function findingLabel(f: FindingLike): string {
  const damage = damageLabel(f.damageCode);
  const parts = [
    componentLabel(f.component),
    f.row && !componentLabel(f.component).toLowerCase().includes(f.row) ? `${f.row} row` : null,
    damage,
    `severity ${f.severity}`,
    f.clockDeg !== null ? clockWords(f.clockDeg) : null,
  ];
  return parts.filter(Boolean).join(" · ");
}
