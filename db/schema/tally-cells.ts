// Roll-up of the cases for the tallies page's counts, kept current by statement triggers on cases
// (db/migrations: tally-cell-triggers) so the verdict cube and the monthly trend sum a few ten
// thousand cells instead of reading every case. Each cell counts the cases that share every column:
// what the page filters by (removal month, site, bearing class, trigger) and what it groups by.
// tests/api/tallies/tally-rollup.test.ts compares the cells with a recount.
import { boolean, date, integer, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";

export const tallyCells = pgTable(
  "tally_cells",
  {
    /** First day of the removal month; null when the removal day is not known. */
    month: date("month"),
    siteId: uuid("site_id"),
    bearingClass: text("bearing_class").notNull(),
    trigger: text("trigger").notNull(),
    signed: boolean("signed").notNull(),
    primaryCause: text("primary_cause"),
    outcome: text("outcome"),
    n: integer("n").notNull(),
  },
  (t) => [
    unique("tally_cells_key").on(t.month, t.siteId, t.bearingClass, t.trigger, t.signed, t.primaryCause, t.outcome).nullsNotDistinct(),
  ],
);
