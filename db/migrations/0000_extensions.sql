-- Trigram matching for fuzzy search over serials, car numbers and narrative text.
CREATE EXTENSION IF NOT EXISTS pg_trgm;
