// The tags a photo carries: which part, which row, where on the clock, which finding, a caption.
import { z } from "@/lib/validation/zod";
import { COMPONENTS, ROWS, type ComponentInfo } from "@/lib/classification/bearing-parts";

const byCode = new Map<string, ComponentInfo>(COMPONENTS.map((c) => [c.code, c]));
export const componentInfo = (code: string): ComponentInfo | undefined => byCode.get(code);

const componentCodes = COMPONENTS.map((c) => c.code) as [string, ...string[]];
const rowCodes = ROWS.map((r) => r.code) as [string, ...string[]];
export const CAPTION_MAX = 500;

// Form fields arrive as strings; an empty one means "not set".
const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

export const photoTagsSchema = z
  .object({
    component: z.preprocess(blankToNull, z.enum(componentCodes, { error: "Choose a part from the list." }).nullable()).optional(),
    row: z.preprocess(blankToNull, z.enum(rowCodes, { error: "Row is inboard or outboard." }).nullable()).optional(),
    clockDeg: z
      .preprocess(
        blankToNull,
        z.coerce
          .number({ error: "Clock position is a number of degrees." })
          .int("Clock position is a whole number of degrees.")
          .min(0, "Clock position is 0–359°.")
          .max(359, "Clock position is 0–359°.")
          .nullable(),
      )
      .optional(),
    findingId: z.preprocess(blankToNull, z.string().uuid("Choose a finding of this case.").nullable()).optional(),
    caption: z.string().trim().max(CAPTION_MAX, `A caption is at most ${CAPTION_MAX} characters.`).optional(),
  })
  .superRefine((t, ctx) => {
    const fixed = t.component ? componentInfo(t.component)?.fixedRow : undefined;
    if (fixed && t.row && t.row !== fixed) {
      ctx.addIssue({ code: "custom", path: ["row"], message: `${componentInfo(t.component!)!.label} is on the ${fixed} row.` });
    }
  })
  .transform((t) => {
    // A part that belongs to one row names that row itself.
    const fixed = t.component ? componentInfo(t.component)?.fixedRow : undefined;
    return fixed ? { ...t, row: fixed } : t;
  });

export type PhotoTags = z.infer<typeof photoTagsSchema>;

/** Reads the tag fields out of a multipart form (missing fields stay unset). */
export function tagsFromForm(form: { get(name: string): unknown }): unknown {
  const out: Record<string, unknown> = {};
  for (const key of ["component", "row", "clockDeg", "findingId", "caption"]) {
    const v = form.get(key);
    if (typeof v === "string") out[key] = v;
  }
  return out;
}
