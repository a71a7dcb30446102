DROP INDEX "analysis_list_updated";--> statement-breakpoint
DROP INDEX "analysis_list_created";--> statement-breakpoint
DROP INDEX "analysis_list_name";--> statement-breakpoint
DROP INDEX "analysis_list_kind";--> statement-breakpoint
DROP INDEX "analysis_list_pass";--> statement-breakpoint
CREATE INDEX "analysis_list_updated" ON "analysis" USING btree ("project_id","updated_at" DESC NULLS LAST,"id","kind","pass","deleted_at") WHERE "analysis"."deleted_at" is null;--> statement-breakpoint
CREATE INDEX "analysis_list_created" ON "analysis" USING btree ("project_id","created_at" DESC NULLS LAST,"updated_at" DESC NULLS FIRST,"id","kind","pass","deleted_at") WHERE "analysis"."deleted_at" is null;--> statement-breakpoint
CREATE INDEX "analysis_list_name" ON "analysis" USING btree ("project_id",lower("name") nulls first,"updated_at" DESC NULLS FIRST,"id","kind","pass","deleted_at") WHERE "analysis"."deleted_at" is null;--> statement-breakpoint
CREATE INDEX "analysis_list_kind" ON "analysis" USING btree ("project_id","kind" NULLS FIRST,"updated_at" DESC NULLS LAST,"id","pass","deleted_at") WHERE "analysis"."deleted_at" is null;--> statement-breakpoint
CREATE INDEX "analysis_list_pass" ON "analysis" USING btree ("project_id","pass" NULLS FIRST,"updated_at" DESC NULLS LAST,"id","kind","deleted_at") WHERE "analysis"."deleted_at" is null;