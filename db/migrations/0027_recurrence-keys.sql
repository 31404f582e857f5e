CREATE TABLE "recurrence_car_counts" (
	"car_mark" text NOT NULL,
	"car_number" text NOT NULL,
	"primary_cause" text NOT NULL,
	"n" integer NOT NULL,
	CONSTRAINT "recurrence_car_counts_key" UNIQUE("car_mark","car_number","primary_cause")
);
--> statement-breakpoint
CREATE TABLE "recurrence_lot_counts" (
	"lot" text NOT NULL,
	"primary_cause" text NOT NULL,
	"n" integer NOT NULL,
	CONSTRAINT "recurrence_lot_counts_key" UNIQUE("lot","primary_cause")
);
