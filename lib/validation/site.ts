// Input rules for sites and their end-play limit policy (server and client alike).
// Limits are stored in inches; the screens let people type either unit.
import { z } from "@/lib/validation/zod";
import type { SiteKind } from "@/db/schema/sites";

export type { SiteKind };

/** The largest end-play limit a site may set: 1/4 in. Anything above is a typing slip, not a policy. */
export const END_PLAY_MAX_CEILING_IN = 0.25;

// The same kinds as the sites table (type-checked both ways), without pulling the ORM into the browser.
export const SITE_KINDS = ["car-shop", "wheel-shop", "lab"] as const satisfies readonly SiteKind[];
const everyKindListed: SiteKind extends (typeof SITE_KINDS)[number] ? true : never = true;
void everyKindListed;

export const SITE_KIND_LABELS: Record<SiteKind, string> = {
  "car-shop": "Car shop",
  "wheel-shop": "Wheel shop",
  lab: "Teardown lab",
};

/** Limits are kept to 5 decimal places of an inch (the column's scale). */
export const POLICY_DECIMALS = 5;
const toStoredInches = (v: number) => Math.round(v * 10 ** POLICY_DECIMALS) / 10 ** POLICY_DECIMALS;

const inches = (what: string) =>
  z
    .number({ message: `${what} must be a number of inches.` })
    .finite(`${what} must be a number of inches.`)
    .positive(`${what} must be more than zero.`)
    .max(END_PLAY_MAX_CEILING_IN, `${what} must be at most ${END_PLAY_MAX_CEILING_IN} in (6.35 mm).`)
    .transform(toStoredInches)
    .refine((v) => v > 0, `${what} is too small to keep (under 0.00001 in).`);

/**
 * The largest plausibility limit a site may set: 1 in (25.4 mm). Mounted end play is thousandths of an
 * inch; a limit above an inch would let a reading typed in the wrong unit through (common practice).
 */
export const PLAUSIBLE_MAX_CEILING_IN = 1;

const plausibleLimit = z
  .number({ message: "The largest believable reading must be a number of inches." })
  .finite("The largest believable reading must be a number of inches.")
  .positive("The largest believable reading must be more than zero.")
  .max(PLAUSIBLE_MAX_CEILING_IN, `The largest believable reading must be at most ${PLAUSIBLE_MAX_CEILING_IN} in (25.4 mm).`)
  .transform(toStoredInches);

export const sitePolicySchema = z.object({
  endPlayMaxIn: inches("The end-play limit"),
  dialSpreadIn: inches("The dial-indicator spread"),
  tapeSpreadIn: inches("The tape spread"),
  plausibleMaxIn: plausibleLimit,
});

/**
 * Limits that only make sense together: the largest believable reading must not fall below the removal
 * limit, or a true over-limit reading would be refused as a slip. Field messages, empty when fine.
 */
export function policyOrderProblems(policy: { endPlayMaxIn: number; plausibleMaxIn: number }): Record<string, string> {
  if (policy.plausibleMaxIn >= policy.endPlayMaxIn) return {};
  return {
    plausibleMaxIn: `The largest believable reading must be at least the end-play limit (${policy.endPlayMaxIn} in), or real removals would be refused as slips.`,
  };
}

/** Cost of one removal at the site (USD), for the money on removals teardown did not confirm; null clears it. */
export const removalCost = z
  .number({ message: "The cost per removal must be a number of dollars." })
  .finite("The cost per removal must be a number of dollars.")
  .min(0, "The cost per removal cannot be negative.")
  .max(10_000_000, "The cost per removal must be under $10,000,000.")
  .transform((v) => Math.round(v * 100) / 100)
  .nullable();

const siteFields = {
  code: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z0-9]{2,8}$/, "Use 2 to 8 letters or digits for the site code, like MJC."),
  name: z.string().trim().min(2, "Enter the site's name.").max(120, "Keep the name under 120 characters."),
  kind: z.enum(SITE_KINDS, { message: "Choose car shop, wheel shop or teardown lab." }),
  railway: z.string().trim().min(2, "Enter the railway or owner that runs the site.").max(120, "Keep the railway under 120 characters."),
  location: z.string().trim().max(120, "Keep the location under 120 characters.").default(""),
  active: z.boolean({ message: "Active is true or false." }),
};

export const siteCreateSchema = z.object({
  ...siteFields,
  active: siteFields.active.default(true),
  endPlayMaxIn: sitePolicySchema.shape.endPlayMaxIn.optional(),
  dialSpreadIn: sitePolicySchema.shape.dialSpreadIn.optional(),
  tapeSpreadIn: sitePolicySchema.shape.tapeSpreadIn.optional(),
  plausibleMaxIn: sitePolicySchema.shape.plausibleMaxIn.optional(),
  removalCostUsd: removalCost.optional(),
});

export const sitePatchSchema = z
  .strictObject(
    {
      code: siteFields.code.optional(),
      name: siteFields.name.optional(),
      kind: siteFields.kind.optional(),
      railway: siteFields.railway.optional(),
      location: z.string().trim().max(120, "Keep the location under 120 characters.").optional(),
      active: siteFields.active.optional(),
      endPlayMaxIn: sitePolicySchema.shape.endPlayMaxIn.optional(),
      dialSpreadIn: sitePolicySchema.shape.dialSpreadIn.optional(),
      tapeSpreadIn: sitePolicySchema.shape.tapeSpreadIn.optional(),
      plausibleMaxIn: sitePolicySchema.shape.plausibleMaxIn.optional(),
      removalCostUsd: removalCost.optional(),
    },
    "Unknown field for a site.",
  )
  .refine((v) => Object.keys(v).length > 0, "Send at least one field to change.");

export type SiteCreateInput = z.infer<typeof siteCreateSchema>;
export type SitePatchInput = z.infer<typeof sitePatchSchema>;
