CREATE TABLE "shop" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"street_address" text NOT NULL,
	"town" text NOT NULL,
	"region" text NOT NULL,
	"postal_code" text NOT NULL,
	"phone" text NOT NULL,
	"email" text NOT NULL,
	"opening_hours" text NOT NULL,
	"default_tolerance_pct" double precision DEFAULT 3 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "shop_tolerance_range" CHECK ("shop"."default_tolerance_pct" between 1 and 5)
);
