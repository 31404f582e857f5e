// Wording the report shares between the PDF and the printable page: dates, clock positions, labels.
import { COMPONENTS, CONFIDENCES, DAMAGE_CODES, DISPOSITIONS, LUBRICANT_CONDITIONS, ROOT_CAUSES, SEVERITIES, TRIGGERS, ZONES } from "@/lib/classification";
import { STAGE_LABELS, type Stage } from "@/lib/cases/stages";
import { formatDay, formatMoment } from "@/lib/dates";

export const DASH = "—";

/** Dates as everywhere in the app (lib/dates.ts): "15 Jun 2026"; a timestamp "20 Jun 2026, 14:05 UTC". */
export function formatDate(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return DASH;
  return formatDay(value) || DASH;
}

export function formatDateTime(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return DASH;
  return formatMoment(value) || DASH;
}

/** 60° → "2 o'clock (60°)"; 75° → "2:30 (75°)": the nearest half hour, as the shop reads a clock. */
export function clockWords(deg: number): string {
  const d = ((Math.round(deg) % 360) + 360) % 360;
  const halfHours = Math.round(d / 15) % 24;
  const hour = Math.floor(halfHours / 2) || 12;
  return halfHours % 2 === 0 ? `${hour} o'clock (${d}°)` : `${hour}:30 (${d}°)`;
}

export const text = (value: string | number | null | undefined, suffix = ""): string =>
  value === null || value === undefined || value === "" ? DASH : `${value}${suffix}`;

const from = <T extends { code: string | number; label: string }>(list: readonly T[]) => (code: string | number | null | undefined) =>
  code === null || code === undefined ? DASH : (list.find((x) => x.code === code)?.label ?? String(code));

export const componentLabel = from(COMPONENTS);
export const dispositionLabel = from(DISPOSITIONS);
export const confidenceLabel = from(CONFIDENCES);
export const severityLabel = from(SEVERITIES);
export const zoneLabel = from(ZONES);
export const lubricantLabel = from(LUBRICANT_CONDITIONS);

type Overrides = Record<string, string> | undefined;
const withOverrides = (base: (c: string | null | undefined) => string) => (code: string | null | undefined, overrides: Overrides) =>
  code && overrides?.[code] ? overrides[code] : base(code);

export const causeLabel = withOverrides(from(ROOT_CAUSES));
export const triggerLabel = withOverrides(from(TRIGGERS));
export const damageLabel = withOverrides(from(DAMAGE_CODES));

export function isoModeOf(code: string): string | null {
  return DAMAGE_CODES.find((d) => d.code === code)?.isoMode ?? null;
}

export function stageLabel(status: string): string {
  return STAGE_LABELS[status as Stage] ?? status;
}

/** "12 × 8 mm", "12 mm long", or a dash. */
export function sizeWords(lengthMm: number | null, widthMm: number | null): string {
  if (lengthMm && widthMm) return `${lengthMm} × ${widthMm} mm`;
  if (lengthMm) return `${lengthMm} mm long`;
  if (widthMm) return `${widthMm} mm wide`;
  return DASH;
}

export function bytesWords(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} KB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}
