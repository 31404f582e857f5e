CREATE INDEX "cases_created_by_idx" ON "cases" USING btree ("created_by");--> statement-breakpoint
CREATE INDEX "cases_list_updated_idx" ON "cases" USING btree ("updated_at" DESC NULLS LAST,"number" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "cases_list_removed_desc_idx" ON "cases" USING btree ("removed_on" DESC NULLS LAST,"number" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "cases_list_removed_asc_idx" ON "cases" USING btree ("removed_on","number" DESC NULLS LAST);