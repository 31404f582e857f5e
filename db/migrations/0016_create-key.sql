ALTER TABLE "cases" ADD COLUMN "create_key" text;--> statement-breakpoint
CREATE UNIQUE INDEX "cases_create_key_idx" ON "cases" USING btree ("created_by","create_key");