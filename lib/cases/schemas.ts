// The shapes of a case's sections as the API accepts them. Clear messages: a shop mechanic reads them.
import { z } from "@/lib/validation/zod";
import { COMPONENTS, CONFIDENCES, DISPOSITIONS, LUBRICANT_CONDITIONS, ZONES } from "@/lib/classification";
import { VISUAL_FINDINGS } from "@/lib/field";
import { BEARING_CLASSES } from "./bearing-classes";

const codes = <T extends { code: string }>(list: readonly T[]) => list.map((x) => x.code) as [string, ...string[]];
const text = (max: number, what: string) => z.string().trim().max(max, `${what}: at most ${max} characters.`);
const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2026-03-14.");
const optionalNumber = (min: number, max: number, what: string) =>
  z
    .number({ message: `${what} must be a number.` })
    .min(min, `${what} must be at least ${min}.`)
    .max(max, `${what} must be at most ${max}.`)
    .nullable()
    .optional();

const feel = z.enum(["smooth", "stiff", "rough", "catch"]).nullable();
const cell = z.object({ feel, revolutions: z.number().min(0).max(20).optional() });
const direction = z.object({ pull: cell.optional(), push: cell.optional() });

export const handRollSchema = z.object({
  grid: z.object({ "0": direction.optional(), "120": direction.optional(), "240": direction.optional() }).default({}),
  procedure: z
    .object({
      turnedBy: z.enum(["hand", "foot"]).optional(),
      oneDirection: z.boolean().optional(),
      judgedBy: z.enum(["feel", "ear"]).optional(),
    })
    .default({}),
});

const reading = z.union([z.number(), text(20, "Reading")]);
export const endPlaySchema = z.object({
  method: z.enum(["dial", "tape"], { message: "Method must be dial indicator or tape." }),
  unit: z.enum(["in", "mm"], { message: "Unit must be in or mm." }),
  trials: z.array(z.object({ zero: reading.optional(), reading })).max(10, "At most 10 trials."),
  turnsByHand: z.boolean().optional(),
  rollersSeated: z.boolean().optional(),
  confirmedAsTyped: z.boolean().optional(),
});

export const fieldChecksSchema = z.object({
  handRoll: handRollSchema.optional(),
  endPlay: endPlaySchema.optional(),
  visual: z
    .array(z.object({ code: z.enum(codes(VISUAL_FINDINGS)), note: text(500, "Note").optional() }))
    .max(20)
    .default([]),
  waysideAlarmConfirmed: z.boolean().optional(),
  confirmations: z
    .object({
      ppe: z.boolean().optional(),
      blueSignal: z.boolean().optional(),
      wheelsetSecured: z.boolean().optional(),
      cooled: z.boolean().optional(),
    })
    .default({}),
});
export type FieldChecks = z.infer<typeof fieldChecksSchema>;

export { BEARING_CLASSES };

/** The field report: bearing, removal and the shop checks. Every key optional so drafts can autosave. */
export const fieldReportSchema = z
  .object({
    serial: text(40, "Serial"),
    bearingClass: z.enum(BEARING_CLASSES, { message: "Choose a bearing class (or other)." }),
    bearingClassOther: text(40, "Other class").nullable(),
    makerCode: text(40, "Maker code"),
    manufacturedYm: z
      .string()
      .regex(/^\d{4}-(0[1-9]|1[0-2])$/, "Use year and month like 2019-07.")
      .nullable(),
    lot: text(40, "Lot").nullable(),
    timesReconditioned: z.number().int("Times reconditioned is a whole number.").min(0).max(20).nullable(),
    mountedOn: isoDate.nullable(),
    carMark: z
      .string()
      .trim()
      .toUpperCase()
      .regex(/^[A-Z]{2,4}$/, "Reporting mark is 2 to 4 letters, like SRRL.")
      .or(z.literal("")),
    carNumber: z
      .string()
      .trim()
      .regex(/^\d{1,6}$/, "Car number is up to 6 digits.")
      .or(z.literal("")),
    axle: z.number().int().min(1, "Axle is 1 to 4.").max(4, "Axle is 1 to 4.").nullable(),
    side: z.enum(["L", "R"], { message: "Side is L or R." }).nullable(),
    wheelDiameterIn: optionalNumber(20, 50, "Wheel diameter (in)"),
    removedOn: isoDate.nullable(),
    siteId: z.string().uuid("Choose the removal site from the list.").nullable(),
    labSiteId: z.string().uuid("Choose the lab from the list.").nullable(),
    trigger: z.string().min(1, "Choose what triggered the removal.").max(40, "Choose a trigger from the list."),
    triggerDetail: z.record(z.string(), z.union([z.string().max(200), z.number(), z.boolean(), z.null()])),
    serviceMiles: z.number().int().min(0).max(10_000_000).nullable(),
    ratingC: optionalNumber(1, 1e9, "Dynamic load rating C"),
    loadP: optionalNumber(1, 1e9, "Equivalent load P"),
    fieldChecks: fieldChecksSchema,
    fieldNotes: text(4000, "Notes"),
  })
  .partial();
export type FieldReportInput = z.infer<typeof fieldReportSchema>;

export const teardownSchema = z
  .object({
    lubricant: z.object({
      conditions: z
        .array(z.enum(codes(LUBRICANT_CONDITIONS)))
        .max(10)
        .optional(),
      notes: text(2000, "Lubricant notes").optional(),
    }),
    dispositions: z.partialRecord(z.enum(codes(COMPONENTS)), z.enum(codes(DISPOSITIONS))),
    teardownNotes: text(8000, "Teardown notes"),
  })
  .partial();

export const findingSchema = z.object({
  component: z.enum(codes(COMPONENTS), { message: "Choose the part the finding is on." }),
  row: z.enum(["inboard", "outboard"]).nullable().optional(),
  damageCode: z.string().min(1, "Choose a damage code.").max(40, "Choose a damage code from the list."),
  severity: z.number().int().min(0, "Severity is 0 to 4.").max(4, "Severity is 0 to 4."),
  clockDeg: z.number().int().min(0, "Clock position is 0° to 359°.").max(359, "Clock position is 0° to 359°.").nullable().optional(),
  arcDeg: z.number().int().min(1, "Arc is 1° to 360°.").max(360, "Arc is 1° to 360°.").nullable().optional(),
  zone: z.enum(codes(ZONES)).nullable().optional(),
  lengthMm: z.number().positive("Length must be more than 0 mm.").max(1000).nullable().optional(),
  widthMm: z.number().positive("Width must be more than 0 mm.").max(1000).nullable().optional(),
  notes: text(2000, "Finding notes").optional(),
});
export type FindingInput = z.infer<typeof findingSchema>;

export const verdictSchema = z
  .object({
    primaryCause: z.string().min(1, "Choose the primary root cause.").max(40, "Choose a root cause from the list.").nullable(),
    contributingCauses: z.array(z.string().min(1)).max(6, "At most 6 contributing causes."),
    confidence: z.enum(codes(CONFIDENCES) as ["confirmed", "probable", "undetermined"]).nullable(),
    removalConfirmed: z.enum(["confirmed", "no-defect"]).nullable(),
    correctiveAction: text(4000, "Corrective action"),
    verdictNotes: text(8000, "Verdict notes"),
  })
  .partial();

export const reasonSchema = z.object({ reason: z.string().trim().min(5, "Give a reason of at least a few words.").max(2000) });

/** What a new removal needs before it can be filed; the form checks it on the device too, so an offline filing is not refused later. */
export const createCaseSchema = fieldReportSchema.required({ trigger: true, siteId: true, removedOn: true });

/** What the form says when a required answer of a new removal is missing (zod's own words name no field). */
const MISSING_WORDS: Record<string, string> = {
  trigger: "Choose what triggered the removal.",
  siteId: "Choose the removal site from the list.",
  removedOn: "Enter the date the bearing was removed.",
};

/** createCaseSchema.parse, with a missing required answer told in the form's words. */
export function parseNewRemoval(body: unknown) {
  const parsed = createCaseSchema.safeParse(body);
  if (parsed.success) return parsed.data;
  for (const issue of parsed.error.issues) {
    const words = MISSING_WORDS[String(issue.path[0])];
    if (words && issue.path.length === 1 && issue.code === "invalid_type") (issue as { message: string }).message = words;
  }
  throw parsed.error;
}
