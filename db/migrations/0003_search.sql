CREATE TABLE "case_search" (
	"case_id" uuid PRIMARY KEY NOT NULL,
	"number" text NOT NULL,
	"status" text NOT NULL,
	"trigger" text NOT NULL,
	"primary_cause" text,
	"bearing_class" text NOT NULL,
	"site_id" uuid,
	"created_by" text,
	"removed_on" date,
	"sort_on" date NOT NULL,
	"created_at" timestamp with time zone NOT NULL,
	"max_severity" integer DEFAULT 0 NOT NULL,
	"damage_codes" text[] DEFAULT '{}' NOT NULL,
	"components" text[] DEFAULT '{}' NOT NULL,
	"finding_keys" text[] DEFAULT '{}' NOT NULL,
	"family_keys" text[] DEFAULT '{}' NOT NULL,
	"identifiers" text NOT NULL,
	"document" "tsvector" NOT NULL
);
--> statement-breakpoint
CREATE TABLE "search_words" (
	"word" text PRIMARY KEY NOT NULL
);
--> statement-breakpoint
ALTER TABLE "case_search" ADD CONSTRAINT "case_search_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "case_search_document_idx" ON "case_search" USING gin ("document");--> statement-breakpoint
CREATE INDEX "case_search_identifiers_trgm_idx" ON "case_search" USING gin ("identifiers" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "case_search_codes_idx" ON "case_search" USING gin ("damage_codes");--> statement-breakpoint
CREATE INDEX "case_search_components_idx" ON "case_search" USING gin ("components");--> statement-breakpoint
CREATE INDEX "case_search_finding_keys_idx" ON "case_search" USING gin ("finding_keys");--> statement-breakpoint
CREATE INDEX "case_search_family_keys_idx" ON "case_search" USING gin ("family_keys");--> statement-breakpoint
CREATE INDEX "case_search_sort_idx" ON "case_search" USING btree ("sort_on","created_at");--> statement-breakpoint
CREATE INDEX "case_search_site_idx" ON "case_search" USING btree ("site_id");--> statement-breakpoint
CREATE INDEX "search_words_trgm_idx" ON "search_words" USING gin ("word" gin_trgm_ops);