// Roll-ups of the cases for the removal-yield tab, kept current by statement triggers on cases
// (db/migrations: yield-roll-ups) so the tab sums a few thousand cells instead of reading every case.
// Each cell counts the cases that share every column; the columns are exactly what the tab's
// filters and groupings read. tests/api/tallies/yield-rollup.test.ts compares them with a recount.
import { boolean, date, integer, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";

/** Signed removals with a recorded teardown outcome: triggers, shops, inspectors and quarters. */
export const yieldCells = pgTable(
  "yield_cells",
  {
    month: date("month"),
    siteId: uuid("site_id"),
    bearingClass: text("bearing_class").notNull(),
    trigger: text("trigger"),
    createdBy: text("created_by"),
    removeCall: boolean("remove_call").notNull(),
    outcome: text("outcome").notNull(),
    n: integer("n").notNull(),
  },
  (t) => [
    unique("yield_cells_key").on(t.month, t.siteId, t.bearingClass, t.trigger, t.createdBy, t.removeCall, t.outcome).nullsNotDistinct(),
  ],
);

/**
 * Wayside alarms (hot-bearing and acoustic) at every stage: the reading's margin and value in whole
 * °F, the acoustic level and the detector, as the tab reads them from the trigger detail.
 */
export const yieldAlarmCells = pgTable(
  "yield_alarm_cells",
  {
    month: date("month"),
    siteId: uuid("site_id"),
    bearingClass: text("bearing_class").notNull(),
    trigger: text("trigger").notNull(),
    createdBy: text("created_by"),
    signed: boolean("signed").notNull(),
    outcome: text("outcome"),
    margin: integer("margin"),
    reading: integer("reading"),
    alarmLevel: text("alarm_level"),
    detectorId: text("detector_id"),
    detectorLocation: text("detector_location"),
    n: integer("n").notNull(),
  },
  (t) => [
    unique("yield_alarm_cells_key")
      .on(
        t.month,
        t.siteId,
        t.bearingClass,
        t.trigger,
        t.createdBy,
        t.signed,
        t.outcome,
        t.margin,
        t.reading,
        t.alarmLevel,
        t.detectorId,
        t.detectorLocation,
      )
      .nullsNotDistinct(),
  ],
);

/**
 * Every keep call with a car position and a removal day, and the day of the next removal of the same
 * car, axle and side after it: at any site, and at the keep call's own site (what an inspector may
 * see). A missed call is a next removal within the chosen window. The triggers recompute the keep
 * calls at every position a write touches, one writer per position at a time.
 */
export const keepGaps = pgTable("keep_gaps", {
  caseId: uuid("case_id").primaryKey(),
  removedOn: date("removed_on").notNull(),
  siteId: uuid("site_id"),
  bearingClass: text("bearing_class").notNull(),
  trigger: text("trigger").notNull(),
  createdBy: text("created_by"),
  nextAny: date("next_any"),
  nextSameSite: date("next_same_site"),
});
