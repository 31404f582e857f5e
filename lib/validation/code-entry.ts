// Input rules for the classification lists that admins keep (damage codes, root causes, triggers).
import { z } from "@/lib/validation/zod";
import type { CodeListName } from "@/db/schema/code-lists";

export type { CodeListName };
import { DAMAGE_FAMILIES } from "@/lib/classification/damage-families";

export const CODE_LIST_NAMES = ["damage", "cause", "trigger"] as const satisfies readonly CodeListName[];

export const CODE_LIST_LABELS: Record<CodeListName, { title: string; one: string }> = {
  damage: { title: "Damage codes", one: "damage code" },
  cause: { title: "Root causes", one: "root cause" },
  trigger: { title: "Removal triggers", one: "removal trigger" },
};

// Damage: "family.name", both lowercase, the name kebab-case. Causes and triggers: kebab-case.
export const DAMAGE_CODE_PATTERN = /^[a-z]+\.[a-z0-9]+(?:-[a-z0-9]+)*$/;
export const KEBAB_CODE_PATTERN = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;

export const listSchema = z.enum(CODE_LIST_NAMES, { message: "The list is damage, cause or trigger." });

/** Splits "rust, red stain\nflaking" into clean, unique shop words. */
export function parseSynonyms(text: string): string[] {
  const seen = new Set<string>();
  const out: string[] = [];
  for (const raw of text.split(/[,\n;]/)) {
    const word = raw.trim().replace(/\s+/g, " ");
    if (word && !seen.has(word.toLowerCase())) {
      seen.add(word.toLowerCase());
      out.push(word);
    }
  }
  return out;
}

const synonymsSchema = z
  .array(z.string().trim().min(1, "A shop word cannot be empty.").max(60, "Keep each shop word under 60 characters."), {
    message: "Shop words are a list of words or phrases.",
  })
  .max(40, "Keep to 40 shop words or fewer.")
  .transform((list) => parseSynonyms(list.join("\n")));

const labelSchema = z.string().trim().min(2, "Enter a label people will recognise.").max(80, "Keep the label under 80 characters.");
const descriptionSchema = z.string().trim().max(400, "Keep the description under 400 characters.");
const isoModeSchema = z.string().trim().max(120, "Keep the ISO mode under 120 characters.").nullable();

const familyCodes = DAMAGE_FAMILIES.map((f) => f.code) as string[];

export const codeCreateSchema = z
  .object({
    list: listSchema,
    code: z.string().trim().toLowerCase().min(2, "Enter a code.").max(60, "Keep the code under 60 characters."),
    label: labelSchema,
    description: descriptionSchema.default(""),
    isoMode: isoModeSchema.optional(),
    synonyms: synonymsSchema.default([]),
  })
  .superRefine((v, ctx) => {
    if (v.list === "damage") {
      if (!DAMAGE_CODE_PATTERN.test(v.code)) {
        ctx.addIssue({ code: "custom", path: ["code"], message: "A damage code is family.name in lowercase, like fatigue.micro-pitting." });
      } else if (!familyCodes.includes(v.code.split(".")[0])) {
        ctx.addIssue({ code: "custom", path: ["code"], message: `Start the code with one of the families: ${familyCodes.join(", ")}.` });
      }
    } else if (!KEBAB_CODE_PATTERN.test(v.code)) {
      ctx.addIssue({ code: "custom", path: ["code"], message: "Use lowercase words joined by hyphens, like axle-current." });
    }
    if (v.list !== "damage" && v.isoMode) {
      ctx.addIssue({ code: "custom", path: ["isoMode"], message: "Only damage codes carry an ISO 15243 mode." });
    }
  });

export const codePatchSchema = z
  .strictObject(
    {
      label: labelSchema.optional(),
      description: descriptionSchema.optional(),
      isoMode: isoModeSchema.optional(),
      synonyms: synonymsSchema.optional(),
      retired: z.boolean({ message: "Retired is true or false." }).optional(),
    },
    "Only the label, description, ISO mode, shop words and retired can change; a code itself never does.",
  )
  .refine((v) => Object.keys(v).length > 0, "Send at least one field to change.");

export type CodeCreateInput = z.infer<typeof codeCreateSchema>;
export type CodePatchInput = z.infer<typeof codePatchSchema>;
