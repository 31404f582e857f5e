-- The damage map joins raceway findings to the filtered cases; with both read in case-id order the
-- join is a cheap merge instead of a hash over every case.
CREATE INDEX IF NOT EXISTS "cases_id_tally_idx" ON "cases" ("id")
  INCLUDE ("status", "removed_on", "site_id", "bearing_class", "trigger");
