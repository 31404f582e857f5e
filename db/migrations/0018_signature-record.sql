ALTER TABLE "cases" ADD COLUMN "signed_meaning" text;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "signed_content_hash" text;