-- The case list's total reads case_list_counts instead of counting every case in the viewer's reach.
-- Statement triggers on cases keep the cells current for every write (inserts, updates, deletes,
-- truncate) in the writer's own transaction: each statement adds its new rows and takes away its old
-- ones, netted per cell, and upserts in key order so concurrent writers lock cells in the same order.
-- A statement that changes none of the counted columns nets to nothing and touches no cell.
CREATE FUNCTION case_list_count() RETURNS trigger LANGUAGE plpgsql AS $fn$
DECLARE
  src text := CASE TG_OP
    WHEN 'INSERT' THEN 'SELECT n.*, 1 AS d FROM new_rows n'
    WHEN 'DELETE' THEN 'SELECT o.*, -1 AS d FROM old_rows o'
    ELSE 'SELECT o.*, -1 AS d FROM old_rows o UNION ALL SELECT n.*, 1 AS d FROM new_rows n' END;
BEGIN
  EXECUTE format($q$
    INSERT INTO case_list_counts AS k (site_id, created_by, status, trigger, bearing_class, primary_cause, n)
    SELECT c.site_id, c.created_by, c.status, c.trigger, c.bearing_class, c.primary_cause, sum(c.d)
    FROM (%s) c
    GROUP BY 1, 2, 3, 4, 5, 6 HAVING sum(c.d) <> 0
    ORDER BY 1, 2, 3, 4, 5, 6
    ON CONFLICT ON CONSTRAINT case_list_counts_key DO UPDATE SET n = k.n + excluded.n$q$, src);
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
CREATE FUNCTION case_list_count_clear() RETURNS trigger LANGUAGE plpgsql AS $fn$
BEGIN
  TRUNCATE case_list_counts;
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
CREATE TRIGGER cases_list_count_insert AFTER INSERT ON cases REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION case_list_count();
--> statement-breakpoint
CREATE TRIGGER cases_list_count_update AFTER UPDATE ON cases REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION case_list_count();
--> statement-breakpoint
CREATE TRIGGER cases_list_count_delete AFTER DELETE ON cases REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION case_list_count();
--> statement-breakpoint
CREATE TRIGGER cases_list_count_truncate AFTER TRUNCATE ON cases FOR EACH STATEMENT EXECUTE FUNCTION case_list_count_clear();
--> statement-breakpoint
-- The cases already stored, counted once.
INSERT INTO case_list_counts (site_id, created_by, status, trigger, bearing_class, primary_cause, n)
SELECT site_id, created_by, status, trigger, bearing_class, primary_cause, count(*)
FROM cases GROUP BY 1, 2, 3, 4, 5, 6;
--> statement-breakpoint
-- A total over a removal-date range cannot come from the cells: this index holds every column the
-- list filters by beside the day, so that count reads the index alone (no visit to the wide rows).
CREATE INDEX IF NOT EXISTS "cases_list_count_day_idx" ON "cases" ("removed_on")
  INCLUDE ("status", "site_id", "created_by", "trigger", "primary_cause", "bearing_class");
