CREATE TABLE "keep_gaps" (
	"case_id" uuid PRIMARY KEY NOT NULL,
	"removed_on" date NOT NULL,
	"site_id" uuid,
	"bearing_class" text NOT NULL,
	"trigger" text NOT NULL,
	"created_by" text,
	"next_any" date,
	"next_same_site" date
);
--> statement-breakpoint
CREATE TABLE "yield_alarm_cells" (
	"month" date,
	"site_id" uuid,
	"bearing_class" text NOT NULL,
	"trigger" text NOT NULL,
	"created_by" text,
	"signed" boolean NOT NULL,
	"outcome" text,
	"margin" integer,
	"reading" integer,
	"alarm_level" text,
	"detector_id" text,
	"detector_location" text,
	"n" integer NOT NULL,
	CONSTRAINT "yield_alarm_cells_key" UNIQUE NULLS NOT DISTINCT("month","site_id","bearing_class","trigger","created_by","signed","outcome","margin","reading","alarm_level","detector_id","detector_location")
);
--> statement-breakpoint
CREATE TABLE "yield_cells" (
	"month" date,
	"site_id" uuid,
	"bearing_class" text NOT NULL,
	"trigger" text,
	"created_by" text,
	"remove_call" boolean NOT NULL,
	"outcome" text NOT NULL,
	"n" integer NOT NULL,
	CONSTRAINT "yield_cells_key" UNIQUE NULLS NOT DISTINCT("month","site_id","bearing_class","trigger","created_by","remove_call","outcome")
);
--> statement-breakpoint
-- The removal-yield tab reads these roll-ups instead of every case. Statement triggers on cases
-- keep them current for every write (inserts, updates, deletes, truncate) in the writer's own
-- transaction: each statement adds its new rows and takes away its old ones, netted per cell, and
-- upserts in key order so concurrent writers lock cells in the same order. Keep calls at every car
-- position the statement touched are recomputed under a per-position lock, so a second writer at the
-- same position waits and then sees the first one's rows.
CREATE FUNCTION yield_roll_up() RETURNS trigger LANGUAGE plpgsql AS $fn$
DECLARE
  src text := CASE TG_OP
    WHEN 'INSERT' THEN 'SELECT n.*, 1 AS d FROM new_rows n'
    WHEN 'DELETE' THEN 'SELECT o.*, -1 AS d FROM old_rows o'
    ELSE 'SELECT o.*, -1 AS d FROM old_rows o UNION ALL SELECT n.*, 1 AS d FROM new_rows n' END;
BEGIN
  EXECUTE format($q$
    INSERT INTO yield_cells AS y (month, site_id, bearing_class, trigger, created_by, remove_call, outcome, n)
    SELECT date_trunc('month', c.removed_on::timestamp)::date, c.site_id, c.bearing_class, c.trigger, c.created_by,
      c.field_call IS NOT DISTINCT FROM 'remove', c.removal_confirmed, sum(c.d)
    FROM (%s) c
    WHERE c.status = 'signed' AND c.removal_confirmed IS NOT NULL
    GROUP BY 1, 2, 3, 4, 5, 6, 7 HAVING sum(c.d) <> 0
    ORDER BY 1, 2, 3, 4, 5, 6, 7
    ON CONFLICT ON CONSTRAINT yield_cells_key DO UPDATE SET n = y.n + excluded.n$q$, src);
  EXECUTE format($q$
    INSERT INTO yield_alarm_cells AS y (month, site_id, bearing_class, trigger, created_by, signed, outcome, margin, reading, alarm_level, detector_id, detector_location, n)
    SELECT date_trunc('month', c.removed_on::timestamp)::date, c.site_id, c.bearing_class, c.trigger, c.created_by,
      c.status = 'signed', c.removal_confirmed, yield_margin(c.trigger, c.trigger_detail), yield_reading(c.trigger, c.trigger_detail),
      CASE WHEN c.trigger = 'wayside-acoustic' THEN coalesce(nullif(trim(c.trigger_detail->>'alarmLevel'), ''), 'not recorded') END,
      nullif(trim(c.trigger_detail->>'detectorId'), ''), nullif(trim(c.trigger_detail->>'detectorLocation'), ''), sum(c.d)
    FROM (%s) c
    WHERE c.trigger IN ('wayside-hot', 'wayside-acoustic')
    GROUP BY 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12 HAVING sum(c.d) <> 0
    ORDER BY 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12
    ON CONFLICT ON CONSTRAINT yield_alarm_cells_key DO UPDATE SET n = y.n + excluded.n$q$, src);
  EXECUTE format($q$
    SELECT count(pg_advisory_xact_lock(k)) FROM (
      SELECT DISTINCT hashtextextended(concat_ws('|', 'keep-gaps', c.car_mark, c.car_number, c.axle, c.side), 0) AS k
      FROM (%s) c WHERE c.axle IS NOT NULL AND c.side IS NOT NULL ORDER BY 1) x$q$, src);
  EXECUTE format($q$
    DELETE FROM keep_gaps g WHERE g.case_id IN (SELECT c.id FROM (%1$s) c)
      OR g.case_id IN (SELECT k.id FROM cases k JOIN (SELECT DISTINCT c.car_mark, c.car_number, c.axle, c.side FROM (%1$s) c) t
        ON k.car_mark = t.car_mark AND k.car_number = t.car_number AND k.axle = t.axle AND k.side = t.side)$q$, src);
  EXECUTE format($q$
    INSERT INTO keep_gaps (case_id, removed_on, site_id, bearing_class, trigger, created_by, next_any, next_same_site)
    SELECT k.id, k.removed_on, k.site_id, k.bearing_class, k.trigger, k.created_by, keep_next_removal(k.car_mark, k.car_number, k.axle, k.side, k.removed_on, NULL),
      keep_next_removal(k.car_mark, k.car_number, k.axle, k.side, k.removed_on, k.site_id)
    FROM cases k JOIN (SELECT DISTINCT c.car_mark, c.car_number, c.axle, c.side FROM (%s) c) t
      ON k.car_mark = t.car_mark AND k.car_number = t.car_number AND k.axle = t.axle AND k.side = t.side
    WHERE k.field_call = 'keep' AND k.removed_on IS NOT NULL
    ON CONFLICT (case_id) DO UPDATE SET removed_on = excluded.removed_on, site_id = excluded.site_id, bearing_class = excluded.bearing_class,
      trigger = excluded.trigger, created_by = excluded.created_by, next_any = excluded.next_any, next_same_site = excluded.next_same_site$q$, src);
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
-- A hot-bearing alarm's reading and its margin over the owner's threshold, in whole °F; null when
-- either is not a number (or too large to be a reading), and for every other trigger.
CREATE FUNCTION yield_reading(trigger text, detail jsonb) RETURNS integer LANGUAGE sql IMMUTABLE AS $fn$
  SELECT CASE WHEN trigger = 'wayside-hot' AND jsonb_typeof(detail->'readingF') = 'number'
    AND abs((detail->>'readingF')::numeric) < 1000000 THEN round((detail->>'readingF')::numeric)::int END
$fn$;
--> statement-breakpoint
CREATE FUNCTION yield_margin(trigger text, detail jsonb) RETURNS integer LANGUAGE sql IMMUTABLE AS $fn$
  SELECT CASE WHEN trigger = 'wayside-hot' AND jsonb_typeof(detail->'readingF') = 'number' AND jsonb_typeof(detail->'thresholdF') = 'number'
    AND abs((detail->>'readingF')::numeric) < 1000000 AND abs((detail->>'thresholdF')::numeric) < 1000000
    THEN round((detail->>'readingF')::numeric - (detail->>'thresholdF')::numeric)::int END
$fn$;
--> statement-breakpoint
-- The next removal of a car position after a day, at any site or (site given) at that site.
CREATE FUNCTION keep_next_removal(mark text, num text, ax integer, sd text, after date, site uuid) RETURNS date LANGUAGE sql STABLE AS $fn$
  SELECT l.removed_on FROM cases l
  WHERE l.car_mark = mark AND l.car_number = num AND l.axle = ax AND l.side = sd AND l.removed_on > after AND (site IS NULL OR l.site_id = site)
  ORDER BY l.removed_on LIMIT 1
$fn$;
--> statement-breakpoint
CREATE FUNCTION yield_roll_up_clear() RETURNS trigger LANGUAGE plpgsql AS $fn$
BEGIN
  TRUNCATE yield_cells, yield_alarm_cells, keep_gaps;
  RETURN NULL;
END
$fn$;
--> statement-breakpoint
CREATE TRIGGER cases_yield_insert AFTER INSERT ON cases REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION yield_roll_up();
--> statement-breakpoint
CREATE TRIGGER cases_yield_update AFTER UPDATE ON cases REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION yield_roll_up();
--> statement-breakpoint
CREATE TRIGGER cases_yield_delete AFTER DELETE ON cases REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION yield_roll_up();
--> statement-breakpoint
CREATE TRIGGER cases_yield_truncate AFTER TRUNCATE ON cases FOR EACH STATEMENT EXECUTE FUNCTION yield_roll_up_clear();
--> statement-breakpoint
-- The cases already stored, counted once.
INSERT INTO yield_cells (month, site_id, bearing_class, trigger, created_by, remove_call, outcome, n)
SELECT date_trunc('month', removed_on::timestamp)::date, site_id, bearing_class, trigger, created_by,
  field_call IS NOT DISTINCT FROM 'remove', removal_confirmed, count(*)
FROM cases WHERE status = 'signed' AND removal_confirmed IS NOT NULL
GROUP BY 1, 2, 3, 4, 5, 6, 7;
--> statement-breakpoint
INSERT INTO yield_alarm_cells (month, site_id, bearing_class, trigger, created_by, signed, outcome, margin, reading, alarm_level, detector_id, detector_location, n)
SELECT date_trunc('month', removed_on::timestamp)::date, site_id, bearing_class, trigger, created_by,
  status = 'signed', removal_confirmed, yield_margin(trigger, trigger_detail), yield_reading(trigger, trigger_detail),
  CASE WHEN trigger = 'wayside-acoustic' THEN coalesce(nullif(trim(trigger_detail->>'alarmLevel'), ''), 'not recorded') END,
  nullif(trim(trigger_detail->>'detectorId'), ''), nullif(trim(trigger_detail->>'detectorLocation'), ''), count(*)
FROM cases WHERE trigger IN ('wayside-hot', 'wayside-acoustic')
GROUP BY 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12;
--> statement-breakpoint
INSERT INTO keep_gaps (case_id, removed_on, site_id, bearing_class, trigger, created_by, next_any, next_same_site)
SELECT id, removed_on, site_id, bearing_class, trigger, created_by, keep_next_removal(car_mark, car_number, axle, side, removed_on, NULL),
  keep_next_removal(car_mark, car_number, axle, side, removed_on, site_id)
FROM cases WHERE field_call = 'keep' AND axle IS NOT NULL AND side IS NOT NULL AND removed_on IS NOT NULL;
