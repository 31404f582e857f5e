-- The text search row carries the facet columns too (see the search schema).
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
    identifiers = excluded.identifiers;

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
    document = excluded.document;

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
--> statement-breakpoint
SELECT tl_case_search_refresh(ARRAY(SELECT id FROM cases));
