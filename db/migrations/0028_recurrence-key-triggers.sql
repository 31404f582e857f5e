-- Recurring causes by car or lot read these counts to find the keys worth the window work.
-- Statement triggers on cases keep them current for every write (inserts, updates, deletes,
-- truncate) in the writer's own transaction: each statement adds its new rows and takes away its old
-- ones, netted per key, and upserts in key order so concurrent writers lock keys in the same order.
-- Counted: signed removals with a removal day and a primary cause, and the key present (as the
-- clusters read them in db/queries/tallies/clusters.ts).
CREATE FUNCTION recurrence_key_count() RETURNS trigger LANGUAGE plpgsql AS $fn$
DECLARE
  src text := CASE TG_OP
    WHEN 'INSERT' THEN 'SELECT n.*, 1 AS d FROM new_rows n'
    WHEN 'DELETE' THEN 'SELECT o.*, -1 AS d FROM old_rows o'
    ELSE 'SELECT o.*, -1 AS d FROM old_rows o UNION ALL SELECT n.*, 1 AS d FROM new_rows n' END;
BEGIN
  EXECUTE format($q$
    INSERT INTO recurrence_car_counts AS k (car_mark, car_number, primary_cause, n)
    SELECT c.car_mark, c.car_number, c.primary_cause, sum(c.d)
    FROM (%s) c
    WHERE c.status = 'signed' AND c.removed_on IS NOT NULL AND c.primary_cause IS NOT NULL AND c.car_mark <> '' AND c.car_number <> ''
    GROUP BY 1, 2, 3 HAVING sum(c.d) <> 0
    ORDER BY 1, 2, 3
    ON CONFLICT ON CONSTRAINT recurrence_car_counts_key DO UPDATE SET n = k.n + excluded.n$q$, src);
  EXECUTE format($q$
    INSERT INTO recurrence_lot_counts AS k (lot, primary_cause, n)
    SELECT c.lot, c.primary_cause, sum(c.d)
    FROM (%s) c
    WHERE c.status = 'signed' AND c.removed_on IS NOT NULL AND c.primary_cause IS NOT NULL AND coalesce(c.lot, '') <> ''
    GROUP BY 1, 2 HAVING sum(c.d) <> 0
    ORDER BY 1, 2
    ON CONFLICT ON CONSTRAINT recurrence_lot_counts_key DO UPDATE SET n = k.n + excluded.n$q$, src);
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
CREATE FUNCTION recurrence_key_clear() RETURNS trigger LANGUAGE plpgsql AS $fn$
BEGIN
  TRUNCATE recurrence_car_counts, recurrence_lot_counts;
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
CREATE TRIGGER cases_recurrence_key_insert AFTER INSERT ON cases REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION recurrence_key_count();
--> statement-breakpoint
CREATE TRIGGER cases_recurrence_key_update AFTER UPDATE ON cases REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION recurrence_key_count();
--> statement-breakpoint
CREATE TRIGGER cases_recurrence_key_delete AFTER DELETE ON cases REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION recurrence_key_count();
--> statement-breakpoint
CREATE TRIGGER cases_recurrence_key_truncate AFTER TRUNCATE ON cases FOR EACH STATEMENT EXECUTE FUNCTION recurrence_key_clear();
--> statement-breakpoint
-- The cases already stored, counted once.
INSERT INTO recurrence_car_counts (car_mark, car_number, primary_cause, n)
SELECT car_mark, car_number, primary_cause, count(*) FROM cases
WHERE status = 'signed' AND removed_on IS NOT NULL AND primary_cause IS NOT NULL AND car_mark <> '' AND car_number <> ''
GROUP BY 1, 2, 3;
--> statement-breakpoint
INSERT INTO recurrence_lot_counts (lot, primary_cause, n)
SELECT lot, primary_cause, count(*) FROM cases
WHERE status = 'signed' AND removed_on IS NOT NULL AND primary_cause IS NOT NULL AND coalesce(lot, '') <> ''
GROUP BY 1, 2;
--> statement-breakpoint
-- Only keys seen at least twice can hold a cluster (two is the smallest cluster by car or lot).
CREATE INDEX "recurrence_car_counts_repeat_idx" ON "recurrence_car_counts" ("car_mark", "car_number", "primary_cause") WHERE "n" >= 2;
--> statement-breakpoint
CREATE INDEX "recurrence_lot_counts_repeat_idx" ON "recurrence_lot_counts" ("lot", "primary_cause") WHERE "n" >= 2;
--> statement-breakpoint
-- Recurring causes by car read each repeated key's cases from this index alone, in day order, and
-- each cluster's newest numbers straight off it.
CREATE INDEX IF NOT EXISTS "cases_car_cause_day_idx" ON "cases" ("car_mark", "car_number", "primary_cause", "removed_on", "number")
  INCLUDE ("status", "site_id", "bearing_class", "trigger");
--> statement-breakpoint
-- Fresh statistics, so the first tallies after the migration plan by the real sizes of the new tables.
ANALYZE tally_cells;
--> statement-breakpoint
ANALYZE recurrence_car_counts;
--> statement-breakpoint
ANALYZE recurrence_lot_counts;
