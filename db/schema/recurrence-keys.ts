// Signed removals counted per car and cause and per bearing lot and cause, whatever the filters, kept
// current by statement triggers on cases (db/migrations: recurrence-key-triggers). Recurring causes by
// car or lot look only at keys with enough removals in all (a key needs that many within the filters
// to hold a cluster), so they read a few thousand cells instead of grouping every case first.
// tests/api/tallies/tally-rollup.test.ts compares the cells with a recount.
import { integer, pgTable, text, unique } from "drizzle-orm/pg-core";

export const recurrenceCarCounts = pgTable(
  "recurrence_car_counts",
  {
    carMark: text("car_mark").notNull(),
    carNumber: text("car_number").notNull(),
    primaryCause: text("primary_cause").notNull(),
    n: integer("n").notNull(),
  },
  (t) => [unique("recurrence_car_counts_key").on(t.carMark, t.carNumber, t.primaryCause)],
);

export const recurrenceLotCounts = pgTable(
  "recurrence_lot_counts",
  {
    lot: text("lot").notNull(),
    primaryCause: text("primary_cause").notNull(),
    n: integer("n").notNull(),
  },
  (t) => [unique("recurrence_lot_counts_key").on(t.lot, t.primaryCause)],
);
