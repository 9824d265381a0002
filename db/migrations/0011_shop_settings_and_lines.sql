ALTER TABLE "shop" ADD COLUMN "time_zone" text DEFAULT 'America/New_York' NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "hours" jsonb DEFAULT '{"mon":[["08:00","17:00"]],"tue":[["08:00","17:00"]],"wed":[["08:00","17:00"]],"thu":[["08:00","17:00"]],"fri":[["08:00","17:00"]],"sat":[["08:00","12:00"]],"sun":[]}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "closed_dates" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "fitting_per_tire_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "disposal_per_tire_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "tire_fee_per_tire_cents" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "tax_rate_bp" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "tax_services" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "stock_item" ADD COLUMN "tread_depth32" smallint;--> statement-breakpoint
ALTER TABLE "tire_line" ADD COLUMN "tread_depth32" smallint;--> statement-breakpoint
ALTER TABLE "tire_line" ADD COLUMN "retired" boolean DEFAULT false NOT NULL;--> statement-breakpoint
CREATE UNIQUE INDEX "brand_name_any_case" ON "brand" USING btree (lower("name"));--> statement-breakpoint
CREATE UNIQUE INDEX "tire_line_brand_name_any_case" ON "tire_line" USING btree ("brand_id",lower("name"));--> statement-breakpoint
ALTER TABLE "shop" DROP COLUMN "opening_hours";--> statement-breakpoint
ALTER TABLE "shop" ADD CONSTRAINT "shop_charges" CHECK ("shop"."fitting_per_tire_cents" >= 0 and "shop"."disposal_per_tire_cents" >= 0 and "shop"."tire_fee_per_tire_cents" >= 0);--> statement-breakpoint
ALTER TABLE "shop" ADD CONSTRAINT "shop_tax_rate" CHECK ("shop"."tax_rate_bp" between 0 and 10000);--> statement-breakpoint
ALTER TABLE "stock_item" ADD CONSTRAINT "stock_item_tread_depth" CHECK ("stock_item"."tread_depth32" between 1 and 40);--> statement-breakpoint
ALTER TABLE "tire_line" ADD CONSTRAINT "tire_line_tread_depth" CHECK ("tire_line"."tread_depth32" between 1 and 40);