// Bearings still in service, uploaded as a fleet list: the suspensions of a life analysis.
// Each upload is one batch; life analyses use the newest batch.
import { date, index, integer, numeric, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";

export const fleetUnits = pgTable(
  "fleet_units",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    batchId: uuid("batch_id").notNull(),
    serial: text("serial").notNull(),
    bearingClass: text("bearing_class").notNull(),
    mountedOn: date("mounted_on"),
    asOf: date("as_of").notNull(),
    serviceMonths: numeric("service_months", { precision: 8, scale: 2, mode: "number" }),
    serviceMiles: integer("service_miles"),
    uploadedBy: text("uploaded_by").references(() => user.id),
    uploadedAt: timestamp("uploaded_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("fleet_units_batch_idx").on(t.batchId, t.bearingClass), index("fleet_units_uploaded_idx").on(t.uploadedAt)],
);

export type FleetUnit = typeof fleetUnits.$inferSelect;
