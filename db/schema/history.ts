// Every change to a case: who, when, what (old -> new), and the reason where one is required.
import { index, jsonb, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { cases } from "./cases";

export type FieldChange = { field: string; from: unknown; to: unknown };

export const caseEvents = pgTable(
  "case_events",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    at: timestamp("at", { withTimezone: true }).notNull().defaultNow(),
    userId: text("user_id").references(() => user.id),
    action: text("action").notNull(),
    changes: jsonb("changes").$type<FieldChange[]>().notNull().default([]),
    reason: text("reason"),
  },
  (t) => [index("case_events_case_idx").on(t.caseId, t.at)],
);

// Related cases, stored both ways so each case lists the other.
export const caseLinks = pgTable(
  "case_links",
  {
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    relatedId: uuid("related_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    note: text("note").notNull().default(""),
    createdBy: text("created_by").references(() => user.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("case_links_pair_idx").on(t.caseId, t.relatedId)],
);

export type CaseEvent = typeof caseEvents.$inferSelect;
