-- Trigram matching for the title search of the layer-check list (ILIKE '%…%' through a GIN index).
-- pg_trgm ships with PostgreSQL's contrib and is a trusted extension (13+), so the database owner may create it.
CREATE EXTENSION IF NOT EXISTS pg_trgm;
