CREATE TABLE "case_search_text" (
	"case_id" uuid PRIMARY KEY NOT NULL,
	"document" "tsvector" NOT NULL
);
--> statement-breakpoint
DROP INDEX "case_search_document_idx";--> statement-breakpoint
ALTER TABLE "case_search_text" ADD CONSTRAINT "case_search_text_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "case_search_text_document_idx" ON "case_search_text" USING gin ("document");--> statement-breakpoint
CREATE INDEX "case_search_trigger_class_idx" ON "case_search" USING btree ("trigger","bearing_class");--> statement-breakpoint
CREATE INDEX "case_search_cause_idx" ON "case_search" USING btree ("primary_cause");--> statement-breakpoint
ALTER TABLE "case_search" DROP COLUMN "document";