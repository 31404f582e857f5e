-- Derived rows, refilled by the next migration: empty first so the new columns can be NOT NULL.
TRUNCATE case_search_text;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "number" text NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "status" text NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "trigger" text NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "primary_cause" text;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "bearing_class" text NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "site_id" uuid;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "created_by" text;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "removed_on" date;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "sort_on" date NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "created_at" timestamp with time zone NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "max_severity" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "damage_codes" text[] DEFAULT '{}' NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "components" text[] DEFAULT '{}' NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "finding_keys" text[] DEFAULT '{}' NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "family_keys" text[] DEFAULT '{}' NOT NULL;--> statement-breakpoint
ALTER TABLE "case_search_text" ADD COLUMN "identifiers" text NOT NULL;