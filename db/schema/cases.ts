// The case: one removed bearing from the shop floor to a signed verdict.
// JSON columns hold structured entry (field checks, lubricant, dispositions) whose shape is
// validated by the zod schemas in lib/cases; the computed results are stored beside them
// so lists and tallies can filter without recomputing.
import { sql } from "drizzle-orm";
import { date, index, uniqueIndex, integer, jsonb, numeric, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { sites } from "./sites";

export const CASE_STATUSES = ["field", "bench", "signoff", "signed"] as const;
export type CaseStatus = (typeof CASE_STATUSES)[number];

export const cases = pgTable(
  "cases",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    number: text("number").notNull().unique(),
    status: text("status").$type<CaseStatus>().notNull().default("field"),
    // Optimistic concurrency: every save must name the version it was based on.
    version: integer("version").notNull().default(1),

    serial: text("serial").notNull().default(""),
    bearingClass: text("bearing_class").notNull().default(""),
    bearingClassOther: text("bearing_class_other"),
    makerCode: text("maker_code").notNull().default(""),
    manufacturedYm: text("manufactured_ym"),
    lot: text("lot"),
    timesReconditioned: integer("times_reconditioned"),
    mountedOn: date("mounted_on"),

    carMark: text("car_mark").notNull().default(""),
    carNumber: text("car_number").notNull().default(""),
    axle: integer("axle"),
    side: text("side").$type<"L" | "R">(),
    wheelDiameterIn: numeric("wheel_diameter_in", { precision: 6, scale: 2, mode: "number" }),
    removedOn: date("removed_on"),
    siteId: uuid("site_id").references(() => sites.id),
    labSiteId: uuid("lab_site_id").references(() => sites.id),
    trigger: text("trigger").notNull().default("other"),
    triggerDetail: jsonb("trigger_detail").$type<Record<string, unknown>>().notNull().default({}),
    serviceMonths: numeric("service_months", { precision: 8, scale: 2, mode: "number" }),
    serviceMiles: integer("service_miles"),
    ratingC: numeric("rating_c", { precision: 12, scale: 2, mode: "number" }),
    loadP: numeric("load_p", { precision: 12, scale: 2, mode: "number" }),

    fieldChecks: jsonb("field_checks").$type<Record<string, unknown>>().notNull().default({}),
    fieldCall: text("field_call").$type<"keep" | "remove" | "undecided">(),
    fieldCallReasons: jsonb("field_call_reasons").$type<unknown[]>().notNull().default([]),
    endPlayMeanIn: numeric("end_play_mean_in", { precision: 8, scale: 5, mode: "number" }),
    fieldNotes: text("field_notes").notNull().default(""),

    receivedAt: timestamp("received_at", { withTimezone: true }),
    receivedBy: text("received_by").references(() => user.id),
    lubricant: jsonb("lubricant").$type<{ conditions?: string[]; notes?: string }>().notNull().default({}),
    dispositions: jsonb("dispositions").$type<Record<string, string>>().notNull().default({}),
    teardownNotes: text("teardown_notes").notNull().default(""),

    primaryCause: text("primary_cause"),
    contributingCauses: text("contributing_causes").array().notNull().default([]),
    confidence: text("confidence").$type<"confirmed" | "probable" | "undetermined">(),
    removalConfirmed: text("removal_confirmed").$type<"confirmed" | "no-defect">(),
    correctiveAction: text("corrective_action").notNull().default(""),
    verdictNotes: text("verdict_notes").notNull().default(""),
    proposedBy: text("proposed_by").references(() => user.id),
    proposedAt: timestamp("proposed_at", { withTimezone: true }),
    signedBy: text("signed_by").references(() => user.id),
    signedAt: timestamp("signed_at", { withTimezone: true }),
    // What the signer confirmed, in words, and a SHA-256 of exactly what was signed (lib/cases/signature-content.ts).
    signedMeaning: text("signed_meaning"),
    signedContentHash: text("signed_content_hash"),
    returnReason: text("return_reason"),

    createdBy: text("created_by").references(() => user.id),
    // The key a device sent with the filing: a replay or a double tap finds this case instead of making another.
    createKey: text("create_key"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedBy: text("updated_by").references(() => user.id),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("cases_status_idx").on(t.status),
    index("cases_site_idx").on(t.siteId),
    index("cases_removed_idx").on(t.removedOn),
    index("cases_trigger_idx").on(t.trigger),
    index("cases_cause_idx").on(t.primaryCause),
    index("cases_car_idx").on(t.carMark, t.carNumber),
    index("cases_serial_idx").on(t.serial),
    index("cases_created_by_idx").on(t.createdBy),
    // The case list's usual orders, each with its tie-break, so a page walks the index and stops.
    index("cases_list_updated_idx").on(t.updatedAt.desc().nullsLast(), t.number.desc()),
    index("cases_list_removed_desc_idx").on(t.removedOn.desc().nullsLast(), t.number.desc()),
    index("cases_list_removed_asc_idx").on(t.removedOn.asc().nullsLast(), t.number.desc()),
    // The car order (mark, then the number by length so 9 comes before 10), each way.
    index("cases_list_car_asc_idx").on(
      sql`nullif(${t.carMark}, '') asc nulls last`,
      sql`length(${t.carNumber}) asc nulls last`,
      sql`${t.carNumber} asc nulls last`,
      t.number.desc().nullsLast(),
    ),
    index("cases_list_car_desc_idx").on(
      sql`nullif(${t.carMark}, '') desc nulls last`,
      sql`length(${t.carNumber}) desc nulls last`,
      sql`${t.carNumber} desc nulls last`,
      t.number.desc().nullsLast(),
    ),
    uniqueIndex("cases_create_key_idx").on(t.createdBy, t.createKey),
    // later removals of the same car and position (missed keep calls)
    index("cases_position_idx").on(t.carMark, t.carNumber, t.axle, t.side, t.removedOn),
  ],
);

// One row per year; the next case number is taken inside the insert's transaction.
export const caseCounters = pgTable("case_counters", {
  year: integer("year").primaryKey(),
  last: integer("last").notNull().default(0),
});

export type Case = typeof cases.$inferSelect;
export type NewCase = typeof cases.$inferInsert;
