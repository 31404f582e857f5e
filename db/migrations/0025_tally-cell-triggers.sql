-- The tallies page's verdict cube and monthly trend read tally_cells instead of every case.
-- Statement triggers on cases keep the cells current for every write (inserts, updates, deletes,
-- truncate) in the writer's own transaction: each statement adds its new rows and takes away its old
-- ones, netted per cell, and upserts in key order so concurrent writers lock cells in the same order.
-- A statement that changes none of the counted columns nets to nothing and touches no cell.
CREATE FUNCTION tally_cell_count() RETURNS trigger LANGUAGE plpgsql AS $fn$
DECLARE
  src text := CASE TG_OP
    WHEN 'INSERT' THEN 'SELECT n.*, 1 AS d FROM new_rows n'
    WHEN 'DELETE' THEN 'SELECT o.*, -1 AS d FROM old_rows o'
    ELSE 'SELECT o.*, -1 AS d FROM old_rows o UNION ALL SELECT n.*, 1 AS d FROM new_rows n' END;
BEGIN
  EXECUTE format($q$
    INSERT INTO tally_cells AS k (month, site_id, bearing_class, trigger, signed, primary_cause, outcome, n)
    SELECT date_trunc('month', c.removed_on::timestamp)::date, c.site_id, c.bearing_class, c.trigger, c.status = 'signed',
      c.primary_cause, c.removal_confirmed, sum(c.d)
    FROM (%s) c
    GROUP BY 1, 2, 3, 4, 5, 6, 7 HAVING sum(c.d) <> 0
    ORDER BY 1, 2, 3, 4, 5, 6, 7
    ON CONFLICT ON CONSTRAINT tally_cells_key DO UPDATE SET n = k.n + excluded.n$q$, src);
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
CREATE FUNCTION tally_cell_clear() RETURNS trigger LANGUAGE plpgsql AS $fn$
BEGIN
  TRUNCATE tally_cells;
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
CREATE TRIGGER cases_tally_cell_insert AFTER INSERT ON cases REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION tally_cell_count();
--> statement-breakpoint
CREATE TRIGGER cases_tally_cell_update AFTER UPDATE ON cases REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION tally_cell_count();
--> statement-breakpoint
CREATE TRIGGER cases_tally_cell_delete AFTER DELETE ON cases REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION tally_cell_count();
--> statement-breakpoint
CREATE TRIGGER cases_tally_cell_truncate AFTER TRUNCATE ON cases FOR EACH STATEMENT EXECUTE FUNCTION tally_cell_clear();
--> statement-breakpoint
-- The cases already stored, counted once.
INSERT INTO tally_cells (month, site_id, bearing_class, trigger, signed, primary_cause, outcome, n)
SELECT date_trunc('month', removed_on::timestamp)::date, site_id, bearing_class, trigger, status = 'signed', primary_cause, removal_confirmed, count(*)
FROM cases GROUP BY 1, 2, 3, 4, 5, 6, 7;
