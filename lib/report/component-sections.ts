// Teardown findings grouped by part, in the order the bearing comes apart, each with its photos.
import { COMPONENTS } from "@/lib/classification";
import { clockWords } from "@/lib/damage-map/geometry";
import { componentLabel, damageLabel, dispositionLabel, severityLabel, zoneLabel } from "@/lib/classification/labels";
import { isoModeOf, sizeWords } from "./format";
import type { ComponentSection, ReportPhoto, ReportSource } from "./types";

const OTHER = "general";
const order = (code: string) => {
  const i = COMPONENTS.findIndex((c) => c.code === code);
  return i === -1 ? COMPONENTS.length : i;
};

/** Photos numbered 1…n in report order: by part, then as they were taken into the case. */
export function numberPhotos(source: ReportSource): ReportPhoto[] {
  const sorted = source.photos
    .map((p, i) => ({ p, i }))
    .sort((a, b) => order(a.p.component ?? OTHER) - order(b.p.component ?? OTHER) || a.i - b.i);
  return sorted.map(({ p }, i) => ({
    id: p.id,
    number: i + 1,
    caption: p.caption.trim() || p.fileName || `Photo ${i + 1}`,
    component: p.component ? componentLabel(p.component) : "General",
    sha256: p.sha256,
    fileName: p.fileName,
    contentType: p.contentType,
    bytes: p.bytes,
  }));
}

export function componentSections(source: ReportSource, photos: ReportPhoto[]): ComponentSection[] {
  const photoById = new Map(photos.map((p) => [p.id, p]));
  const codes = new Set<string>([
    ...source.findings.map((f) => f.component),
    ...source.photos.map((p) => p.component ?? OTHER),
    ...Object.keys(source.case.dispositions ?? {}),
  ]);
  return [...codes]
    .sort((a, b) => order(a) - order(b) || a.localeCompare(b))
    .map((code) => {
      const findings = source.findings
        .filter((f) => f.component === code)
        .map((f) => {
          const where = [
            f.row ? `${f.row === "inboard" ? "Inboard" : "Outboard"} row` : null,
            f.zone ? zoneLabel(f.zone) : null,
            f.clockDeg !== null && f.clockDeg !== undefined ? `at ${clockWords(f.clockDeg)}` : null,
            f.arcDeg ? `over ${f.arcDeg}°` : null,
          ].filter(Boolean);
          const photoNumbers = source.photos
            .filter((p) => p.findingId === f.id)
            .map((p) => photoById.get(p.id)!.number)
            .sort((a, b) => a - b);
          return {
            id: f.id,
            damage: damageLabel(f.damageCode, source.labels?.damage),
            code: f.damageCode,
            isoMode: isoModeOf(f.damageCode),
            severity: f.severity,
            severityLabel: `${f.severity} · ${severityLabel(f.severity)}`,
            where: where.length ? where.join(", ") : "Place not recorded",
            size: sizeWords(f.lengthMm, f.widthMm),
            notes: f.notes.trim(),
            photoNumbers,
          };
        });
      const disposition = source.case.dispositions?.[code];
      return {
        code,
        label: code === OTHER ? "General" : componentLabel(code),
        disposition: disposition ? dispositionLabel(disposition) : null,
        findings,
        photos: photos.filter((p) => source.photos.find((s) => s.id === p.id)?.component === (code === OTHER ? null : code)),
      };
    });
}
