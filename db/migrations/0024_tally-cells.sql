CREATE TABLE "tally_cells" (
	"month" date,
	"site_id" uuid,
	"bearing_class" text NOT NULL,
	"trigger" text NOT NULL,
	"signed" boolean NOT NULL,
	"primary_cause" text,
	"outcome" text,
	"n" integer NOT NULL,
	CONSTRAINT "tally_cells_key" UNIQUE NULLS NOT DISTINCT("month","site_id","bearing_class","trigger","signed","primary_cause","outcome")
);
