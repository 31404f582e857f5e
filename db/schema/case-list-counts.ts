// How many cases share each mix of the case list's reach and filter columns, kept current by
// statement triggers on cases (db/migrations: case-list-counts) so the list's total sums a few
// thousand cells instead of counting every case in reach. tests/api/cases/list-counts.test.ts
// compares the cells with a recount.
import { integer, pgTable, text, unique, uuid } from "drizzle-orm/pg-core";

export const caseListCounts = pgTable(
  "case_list_counts",
  {
    siteId: uuid("site_id"),
    createdBy: text("created_by"),
    status: text("status").notNull(),
    trigger: text("trigger").notNull(),
    bearingClass: text("bearing_class").notNull(),
    primaryCause: text("primary_cause"),
    n: integer("n").notNull(),
  },
  (t) => [unique("case_list_counts_key").on(t.siteId, t.createdBy, t.status, t.trigger, t.bearingClass, t.primaryCause).nullsNotDistinct()],
);
