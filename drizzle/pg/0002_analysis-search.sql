-- Search of a project's analyses by name and summary (src/lib/server/db/search.ts), on PostgreSQL:
-- ILIKE '%…%' over the analysis rows, answered for three characters or more by a pg_trgm trigram
-- index instead of reading every analysis (SQLite's FTS5 index is drizzle/0008). pg_trgm is a trusted
-- extension (PostgreSQL 13+): the database's owner may create it. Not part of the Drizzle schema.
CREATE EXTENSION IF NOT EXISTS pg_trgm;
--> statement-breakpoint
CREATE INDEX IF NOT EXISTS "analysis_search_trgm" ON "analysis" USING gin ("name" gin_trgm_ops, "summary" gin_trgm_ops) WHERE "deleted_at" is null;
