// Wording the report shares between the PDF and the printable page: dates, sizes, stages.
// Code labels come from lib/classification/labels.ts, clock words from lib/damage-map/geometry.ts.
import { DAMAGE_CODES } from "@/lib/classification/damage-codes";
import { STAGE_LABELS, type Stage } from "@/lib/cases/stages";
import { formatDay, formatMoment } from "@/lib/dates";

import { NO_CODE } from "@/lib/classification/labels";

export const DASH = NO_CODE;

/** Dates as everywhere in the app (lib/dates.ts): "15 Jun 2026"; a timestamp "20 Jun 2026, 14:05 UTC". */
export function formatDate(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return DASH;
  return formatDay(value) || DASH;
}

export function formatDateTime(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return DASH;
  return formatMoment(value) || DASH;
}

export const text = (value: string | number | null | undefined, suffix = ""): string =>
  value === null || value === undefined || value === "" ? DASH : `${value}${suffix}`;

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
