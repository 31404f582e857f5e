CREATE TABLE "fleet_units" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"batch_id" uuid NOT NULL,
	"serial" text NOT NULL,
	"bearing_class" text NOT NULL,
	"mounted_on" date,
	"as_of" date NOT NULL,
	"service_months" numeric(8, 2),
	"service_miles" integer,
	"uploaded_by" text,
	"uploaded_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "fleet_units" ADD CONSTRAINT "fleet_units_uploaded_by_user_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "fleet_units_batch_idx" ON "fleet_units" USING btree ("batch_id","bearing_class");--> statement-breakpoint
CREATE INDEX "fleet_units_uploaded_idx" ON "fleet_units" USING btree ("uploaded_at");