// Teardown findings: what was seen on which part, where and how large.
import { index, integer, numeric, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { cases } from "./cases";

export const findings = pgTable(
  "findings",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    component: text("component").notNull(),
    row: text("row").$type<"inboard" | "outboard">(),
    damageCode: text("damage_code").notNull(),
    severity: integer("severity").notNull(),
    // 0° = 12 o'clock, clockwise seen from the outboard end; arc is the extent in degrees.
    clockDeg: integer("clock_deg"),
    arcDeg: integer("arc_deg"),
    zone: text("zone"),
    lengthMm: numeric("length_mm", { precision: 8, scale: 2, mode: "number" }),
    widthMm: numeric("width_mm", { precision: 8, scale: 2, mode: "number" }),
    notes: text("notes").notNull().default(""),
    createdBy: text("created_by").references(() => user.id),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("findings_case_idx").on(t.caseId), index("findings_code_idx").on(t.damageCode, t.component)],
);

export type Finding = typeof findings.$inferSelect;
