// Display labels for codes, tolerant of codes admins added after these lists were written.
import { COMPONENTS, CONFIDENCES, DAMAGE_CODES, DISPOSITIONS, LUBRICANT_CONDITIONS, ROOT_CAUSES, SEVERITIES, TRIGGERS, ZONES } from "@/lib/classification";

const find = (list: readonly { code: string | number; label: string }[], code: string | number | null | undefined) =>
  code === null || code === undefined ? "—" : (list.find((x) => String(x.code) === String(code))?.label ?? String(code));

export const triggerLabel = (c?: string | null) => find(TRIGGERS, c);
export const causeLabel = (c?: string | null) => find(ROOT_CAUSES, c);
export const damageLabel = (c?: string | null) => find(DAMAGE_CODES, c);
export const componentLabel = (c?: string | null) => find(COMPONENTS, c);
export const zoneLabel = (c?: string | null) => find(ZONES, c);
export const dispositionLabel = (c?: string | null) => find(DISPOSITIONS, c);
export const confidenceLabel = (c?: string | null) => find(CONFIDENCES, c);
export const lubricantLabel = (c?: string | null) => find(LUBRICANT_CONDITIONS, c);
export const severityLabel = (s?: number | null) => find(SEVERITIES as unknown as { code: number; label: string }[], s);
