// The one lookup from a stored code to the words people read: parts, rows, zones, damage, causes,
// triggers, dispositions, confidence, grease, severity, bearing class. Pure. A code an admin added
// after these lists were written reads as itself; `overrides` carries admins' own labels
// (code_entries) where a caller has loaded them. No code at all reads as a dash.
import { COMPONENTS, CONFIDENCES, DISPOSITIONS, LUBRICANT_CONDITIONS, ROWS, SEVERITIES, ZONES } from "./bearing-parts";
import { DAMAGE_CODES } from "./damage-codes";
import { DAMAGE_FAMILIES } from "./damage-families";
import { ROOT_CAUSES } from "./root-causes";
import { TRIGGERS } from "./triggers";

export const NO_CODE = "—";

type Code = string | number | null | undefined;
export type LabelOverrides = Readonly<Record<string, string>> | undefined;

/** A label finder over one list, built once (a Map), so hot loops over many rows stay cheap. */
function lookup(list: readonly { code: string | number; label: string }[]) {
  const byCode = new Map(list.map((x) => [String(x.code), x.label]));
  return (code: Code, overrides?: LabelOverrides): string => {
    if (code === null || code === undefined || code === "") return NO_CODE;
    const key = String(code);
    return overrides?.[key] ?? byCode.get(key) ?? key;
  };
}

export const componentLabel = lookup(COMPONENTS);
export const rowLabel = lookup(ROWS);
export const zoneLabel = lookup(ZONES);
export const damageLabel = lookup(DAMAGE_CODES);
export const familyLabel = lookup(DAMAGE_FAMILIES);
export const causeLabel = lookup(ROOT_CAUSES);
export const triggerLabel = lookup(TRIGGERS);
export const dispositionLabel = lookup(DISPOSITIONS);
export const confidenceLabel = lookup(CONFIDENCES);
export const lubricantLabel = lookup(LUBRICANT_CONDITIONS);
export const severityLabel = lookup(SEVERITIES);

const phrases = new Map(COMPONENTS.map((c) => [c.code as string, c.phrase]));
/** The part as a sentence says it: "the cup". */
export const componentPhrase = (code: string): string => phrases.get(code) ?? code;

export { bearingClassLabel } from "@/lib/cases/bearing-classes";
