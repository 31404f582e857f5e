-- The search index as it lives in the database, in one place. The migrations (0003 to 0013) built
-- it step by step; this file is the result, and tests/api/search/search-index-sql.test.ts fails
-- when the migrated database and this file differ. Change both together: a new migration with
-- the new definition, and this file.
--
-- How the index stays fresh:
--   1. Any INSERT/UPDATE on cases, or INSERT/UPDATE/DELETE on findings, fires a statement trigger
--      that queues the touched case ids in search_pending under the current transaction id.
--   2. A deferred constraint trigger on search_pending fires at commit; the first one takes every
--      id this transaction queued and calls tl_case_search_refresh once for them all.
--   3. tl_case_search_refresh upserts case_search (the narrow row for filters and facets) and
--      case_search_text (the same plus the tsvector document), skipping rows that did not change,
--      and adds new words to search_words (the typo-correction vocabulary).
--   4. Every change to case_search moves the case_search_revision sequence, which the facet cache
--      (db/queries/search-facet-cache.ts) compares before reusing counts.

CREATE UNLOGGED TABLE IF NOT EXISTS search_pending (txid bigint NOT NULL, ids uuid[] NOT NULL);
CREATE INDEX IF NOT EXISTS search_pending_txid_idx ON search_pending (txid);
CREATE SEQUENCE IF NOT EXISTS case_search_revision;

CREATE OR REPLACE FUNCTION tl_case_search_refresh(ids uuid[]) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO case_search AS s (case_id, number, status, trigger, primary_cause, bearing_class, site_id, created_by,
      removed_on, sort_on, created_at, max_severity, damage_codes, components, finding_keys, family_keys, identifiers)
  SELECT c.id, c.number, c.status, c.trigger, c.primary_cause, c.bearing_class, c.site_id, c.created_by,
      c.removed_on, coalesce(c.removed_on, (c.created_at AT TIME ZONE 'UTC')::date), c.created_at,
      coalesce(f.max_severity, 0), coalesce(f.codes, '{}'), coalesce(f.components, '{}'),
      coalesce(f.finding_keys, '{}'), coalesce(f.family_keys, '{}'),
      concat_ws(' ', c.number, c.serial, c.car_mark, c.car_number)
  FROM cases c
  LEFT JOIN LATERAL (
    SELECT max(fi.severity) AS max_severity,
      array_agg(DISTINCT fi.damage_code) AS codes,
      array_agg(DISTINCT fi.component) AS components,
      array_agg(DISTINCT fi.component || '|' || fi.damage_code) FILTER (WHERE fi.damage_code <> 'none') AS finding_keys,
      array_agg(DISTINCT fi.component || '|' || split_part(fi.damage_code, '.', 1)) FILTER (WHERE fi.damage_code <> 'none') AS family_keys
    FROM findings fi WHERE fi.case_id = c.id
  ) f ON true
  WHERE c.id = ANY(ids)
  ON CONFLICT (case_id) DO UPDATE SET
    number = excluded.number, status = excluded.status, trigger = excluded.trigger,
    primary_cause = excluded.primary_cause, bearing_class = excluded.bearing_class, site_id = excluded.site_id,
    created_by = excluded.created_by, removed_on = excluded.removed_on, sort_on = excluded.sort_on,
    created_at = excluded.created_at, max_severity = excluded.max_severity, damage_codes = excluded.damage_codes,
    components = excluded.components, finding_keys = excluded.finding_keys, family_keys = excluded.family_keys,
    identifiers = excluded.identifiers
  -- A save that changes nothing search reads leaves the row alone: no new row version.
  WHERE (s.number, s.status, s.trigger, s.primary_cause, s.bearing_class, s.site_id, s.created_by, s.removed_on, s.sort_on, s.created_at, s.max_severity, s.damage_codes, s.components, s.finding_keys, s.family_keys, s.identifiers)
    IS DISTINCT FROM (excluded.number, excluded.status, excluded.trigger, excluded.primary_cause, excluded.bearing_class, excluded.site_id, excluded.created_by, excluded.removed_on, excluded.sort_on, excluded.created_at, excluded.max_severity, excluded.damage_codes, excluded.components, excluded.finding_keys, excluded.family_keys, excluded.identifiers);

  -- The same row again with the narrative, so a text search needs no join. Damage codes and
  -- parts ride along as verbatim lexemes ("dc:…", "pc:…"): one index scan answers "these words,
  -- or a finding coded as what they mean".
  INSERT INTO case_search_text AS x (case_id, number, status, trigger, primary_cause, bearing_class, site_id, created_by, removed_on, sort_on, created_at, max_severity, damage_codes, components, finding_keys, family_keys, identifiers, document)
  SELECT s.case_id, s.number, s.status, s.trigger, s.primary_cause, s.bearing_class, s.site_id, s.created_by, s.removed_on, s.sort_on, s.created_at, s.max_severity, s.damage_codes, s.components, s.finding_keys, s.family_keys, s.identifiers,
    setweight(to_tsvector('simple', concat_ws(' ', c.number, c.serial, c.car_mark, c.car_number)), 'A')
      || setweight(to_tsvector('english', concat_ws(' ', f.notes, c.teardown_notes, c.verdict_notes)), 'B')
      || setweight(to_tsvector('english', concat_ws(' ', c.field_notes, c.corrective_action, c.lubricant->>'notes')), 'C')
      || array_to_tsvector(f.keys)
  FROM case_search s
  JOIN cases c ON c.id = s.case_id
  LEFT JOIN LATERAL (
    SELECT string_agg(fi.notes, ' ' ORDER BY fi.created_at) AS notes,
      coalesce(array_agg(DISTINCT 'dc:' || fi.damage_code) || array_agg(DISTINCT 'pc:' || fi.component), '{}') AS keys
    FROM findings fi WHERE fi.case_id = c.id
  ) f ON true
  WHERE s.case_id = ANY(ids)
  ON CONFLICT (case_id) DO UPDATE SET number = excluded.number, status = excluded.status, trigger = excluded.trigger, primary_cause = excluded.primary_cause, bearing_class = excluded.bearing_class, site_id = excluded.site_id, created_by = excluded.created_by, removed_on = excluded.removed_on, sort_on = excluded.sort_on, created_at = excluded.created_at, max_severity = excluded.max_severity, damage_codes = excluded.damage_codes, components = excluded.components, finding_keys = excluded.finding_keys, family_keys = excluded.family_keys, identifiers = excluded.identifiers,
    document = excluded.document
  WHERE (x.number, x.status, x.trigger, x.primary_cause, x.bearing_class, x.site_id, x.created_by, x.removed_on, x.sort_on, x.created_at, x.max_severity, x.damage_codes, x.components, x.finding_keys, x.family_keys, x.identifiers, x.document)
    IS DISTINCT FROM (excluded.number, excluded.status, excluded.trigger, excluded.primary_cause, excluded.bearing_class, excluded.site_id, excluded.created_by, excluded.removed_on, excluded.sort_on, excluded.created_at, excluded.max_severity, excluded.damage_codes, excluded.components, excluded.finding_keys, excluded.family_keys, excluded.identifiers, excluded.document);

  -- Sorted, so two sessions adding the same new words take their locks in the same order.
  INSERT INTO search_words (word)
  SELECT DISTINCT w FROM cases c
    LEFT JOIN LATERAL (SELECT string_agg(fi.notes, ' ') AS notes FROM findings fi WHERE fi.case_id = c.id) f ON true,
    regexp_split_to_table(lower(concat_ws(' ', f.notes, c.teardown_notes, c.verdict_notes, c.field_notes,
      c.corrective_action, c.lubricant->>'notes')), '[^a-z]+') AS w
  WHERE c.id = ANY(ids) AND length(w) BETWEEN 3 AND 40
  ORDER BY w
  ON CONFLICT (word) DO NOTHING;
END
$$;

CREATE OR REPLACE FUNCTION tl_case_search_from_cases() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO search_pending (txid, ids) VALUES (txid_current(), ARRAY(SELECT DISTINCT id FROM changed_cases));
  RETURN NULL;
END
$$;

CREATE OR REPLACE FUNCTION tl_case_search_from_findings() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO search_pending (txid, ids) VALUES (txid_current(), ARRAY(SELECT DISTINCT case_id FROM changed_findings));
  RETURN NULL;
END
$$;

CREATE OR REPLACE FUNCTION tl_search_pending_flush() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  pending uuid[];
BEGIN
  WITH taken AS (DELETE FROM search_pending WHERE txid = txid_current() RETURNING ids)
  SELECT ARRAY(SELECT DISTINCT i FROM taken, unnest(taken.ids) AS i) INTO pending;
  IF cardinality(pending) > 0 THEN
    PERFORM tl_case_search_refresh(pending);
  END IF;
  RETURN NULL;
END
$$;

CREATE OR REPLACE FUNCTION tl_case_search_bump() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM nextval('case_search_revision');
  RETURN NULL;
END
$$;

CREATE TRIGGER case_search_cases_insert AFTER INSERT ON public.cases REFERENCING NEW TABLE AS changed_cases FOR EACH STATEMENT EXECUTE FUNCTION tl_case_search_from_cases();
CREATE TRIGGER case_search_cases_update AFTER UPDATE ON public.cases REFERENCING NEW TABLE AS changed_cases FOR EACH STATEMENT EXECUTE FUNCTION tl_case_search_from_cases();
CREATE TRIGGER case_search_findings_insert AFTER INSERT ON public.findings REFERENCING NEW TABLE AS changed_findings FOR EACH STATEMENT EXECUTE FUNCTION tl_case_search_from_findings();
CREATE TRIGGER case_search_findings_update AFTER UPDATE ON public.findings REFERENCING NEW TABLE AS changed_findings FOR EACH STATEMENT EXECUTE FUNCTION tl_case_search_from_findings();
CREATE TRIGGER case_search_findings_delete AFTER DELETE ON public.findings REFERENCING OLD TABLE AS changed_findings FOR EACH STATEMENT EXECUTE FUNCTION tl_case_search_from_findings();
CREATE CONSTRAINT TRIGGER search_pending_flush AFTER INSERT ON public.search_pending DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION tl_search_pending_flush();
CREATE TRIGGER case_search_revision_bump AFTER INSERT OR DELETE OR UPDATE OR TRUNCATE ON public.case_search FOR EACH STATEMENT EXECUTE FUNCTION tl_case_search_bump();
