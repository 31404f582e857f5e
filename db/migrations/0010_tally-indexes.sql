-- Tallies count in PostgreSQL over every case: these indexes let each GROUP BY read a narrow
-- index instead of the wide cases rows (index-only scans).
-- Signed verdicts and removals by period, with every column the tallies group or filter by.
CREATE INDEX IF NOT EXISTS "cases_tally_idx" ON "cases" ("status", "removed_on")
  INCLUDE ("site_id", "trigger", "primary_cause", "removal_confirmed", "bearing_class", "id", "number", "car_mark", "car_number", "lot", "service_months", "service_miles");
--> statement-breakpoint
-- Recurring causes at one site: days arrive already in order for the window functions.
CREATE INDEX IF NOT EXISTS "cases_site_cause_day_idx" ON "cases" ("status", "site_id", "primary_cause", "removed_on")
  INCLUDE ("number", "bearing_class", "trigger");
--> statement-breakpoint
-- The damage map reads only findings it can place on a raceway.
CREATE INDEX IF NOT EXISTS "findings_raceway_idx" ON "findings" ("case_id")
  INCLUDE ("component", "row", "severity", "clock_deg", "arc_deg")
  WHERE "clock_deg" IS NOT NULL AND "component" IN ('cup', 'cone-inboard', 'cone-outboard');
