// Words used in similarity reasons, taken from the classification lists; codes
// not in the lists (added later by admins) read as themselves.
import { COMPONENTS } from "@/lib/classification/components";
import { damageCodeInfo } from "@/lib/classification/damage-codes";
import { DAMAGE_FAMILIES } from "@/lib/classification/damage-families";
import { ROOT_CAUSES } from "@/lib/classification/root-causes";
import { TRIGGERS } from "@/lib/classification/triggers";

export const componentPhrase = (code: string) => COMPONENTS.find((c) => c.code === code)?.phrase ?? code;
export const damageLabel = (code: string) => damageCodeInfo(code)?.label ?? code;
export const familyLabel = (code: string) => DAMAGE_FAMILIES.find((f) => f.code === code)?.label ?? code;
export const causeLabel = (code: string) => ROOT_CAUSES.find((c) => c.code === code)?.label ?? code;
export const triggerLabel = (code: string) => TRIGGERS.find((t) => t.code === code)?.label ?? code;

/** " on the cup", or nothing for the grease (where "Grease with water on the grease" would read badly). */
export const onPart = (component: string) => (component === "lubricant" ? "" : ` on ${componentPhrase(component)}`);
