// Wording the report shares between the PDF and the printable page: dates, sizes, stages.
// Code labels come from lib/classification/labels.ts, clock words from lib/damage-map/geometry.ts.
import { DAMAGE_CODES } from "@/lib/classification/damage-codes";
import { STAGE_LABELS, type Stage } from "@/lib/cases/stages";

import { NO_CODE } from "@/lib/classification/labels";

export const DASH = NO_CODE;

/** "2026-06-15" stays as written; a timestamp becomes "2026-06-20 14:05 UTC". */
export function formatDate(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return DASH;
  if (typeof value === "string" && /^\d{4}-\d{2}-\d{2}$/.test(value)) return value;
  const d = new Date(value);
  if (Number.isNaN(d.getTime())) return String(value);
  return d.toISOString().slice(0, 10);
}

export function formatDateTime(value: Date | string | null | undefined): string {
  if (value === null || value === undefined || value === "") return DASH;
  const d = new Date(value);
  if (Number.isNaN(d.getTime())) return String(value);
  return `${d.toISOString().slice(0, 10)} ${d.toISOString().slice(11, 16)} UTC`;
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
