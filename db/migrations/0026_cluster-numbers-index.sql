-- Recurring causes at one site: the case number joins the key, so each cluster's newest case
-- numbers (removal day, then number, both descending) come straight off the index, 24 entries read
-- instead of every case of the cluster read and sorted.
CREATE INDEX IF NOT EXISTS "cases_site_cause_day_number_idx" ON "cases" ("status", "site_id", "primary_cause", "removed_on", "number")
  INCLUDE ("bearing_class", "trigger");
--> statement-breakpoint
DROP INDEX IF EXISTS "cases_site_cause_day_idx";
