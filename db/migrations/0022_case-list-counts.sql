CREATE TABLE "case_list_counts" (
	"site_id" uuid,
	"created_by" text,
	"status" text NOT NULL,
	"trigger" text NOT NULL,
	"bearing_class" text NOT NULL,
	"primary_cause" text,
	"n" integer NOT NULL,
	CONSTRAINT "case_list_counts_key" UNIQUE NULLS NOT DISTINCT("site_id","created_by","status","trigger","bearing_class","primary_cause")
);
--> statement-breakpoint
CREATE INDEX "cases_list_car_asc_idx" ON "cases" USING btree (nullif("car_mark", '') asc nulls last,length("car_number") asc nulls last,"car_number" asc nulls last,"number" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "cases_list_car_desc_idx" ON "cases" USING btree (nullif("car_mark", '') desc nulls last,length("car_number") desc nulls last,"car_number" desc nulls last,"number" DESC NULLS LAST);