-- A revision number that moves whenever any search row changes, so facet counts computed
-- for a search can be reused (paging, sorting, the search page's first view) until then.
-- A sequence, not a counter row: it never makes two case saves wait on each other.
CREATE SEQUENCE IF NOT EXISTS case_search_revision;
--> statement-breakpoint
CREATE OR REPLACE FUNCTION tl_case_search_bump() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM nextval('case_search_revision');
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER case_search_revision_bump AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON case_search
  FOR EACH STATEMENT EXECUTE FUNCTION tl_case_search_bump();
