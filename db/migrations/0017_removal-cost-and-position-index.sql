ALTER TABLE "sites" ADD COLUMN "removal_cost_usd" numeric(12, 2);--> statement-breakpoint
CREATE INDEX "cases_position_idx" ON "cases" USING btree ("car_mark","car_number","axle","side","removed_on");