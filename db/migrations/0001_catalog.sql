CREATE TABLE "brand" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	CONSTRAINT "brand_name_unique" UNIQUE("name")
);
--> statement-breakpoint
CREATE TABLE "stock_item" (
	"id" serial PRIMARY KEY NOT NULL,
	"sku" text NOT NULL,
	"line_id" integer NOT NULL,
	"designation" text NOT NULL,
	"size_kind" text NOT NULL,
	"prefix" text,
	"section_width_mm" double precision NOT NULL,
	"aspect_ratio" smallint,
	"rim_diameter_in" double precision NOT NULL,
	"construction" text NOT NULL,
	"zr" boolean NOT NULL,
	"commercial" boolean NOT NULL,
	"run_flat" boolean NOT NULL,
	"load_index" smallint NOT NULL,
	"load_index_dual" smallint,
	"speed_symbol" text NOT NULL,
	"speed_rank" smallint NOT NULL,
	"load_range" text,
	"load_range_ply" smallint,
	"extra_load" boolean NOT NULL,
	"service_type" text NOT NULL,
	"overall_diameter_mm" double precision NOT NULL,
	"price_cents" integer NOT NULL,
	"quantity_on_hand" integer NOT NULL,
	"retired" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_item_sku_unique" UNIQUE("sku"),
	CONSTRAINT "stock_item_sku_shape" CHECK ("stock_item"."sku" ~ '^[!-~]{1,64}$'),
	CONSTRAINT "stock_item_designation" CHECK (length("stock_item"."designation") between 1 and 40),
	CONSTRAINT "stock_item_size_kind" CHECK ("stock_item"."size_kind" in ('metric', 'flotation')),
	CONSTRAINT "stock_item_prefix" CHECK ("stock_item"."prefix" in ('P', 'LT', 'ST', 'T')),
	CONSTRAINT "stock_item_construction" CHECK ("stock_item"."construction" in ('R', 'D', 'B')),
	CONSTRAINT "stock_item_service_type" CHECK ("stock_item"."service_type" in ('passenger', 'LT', 'C', 'ST', 'T')),
	CONSTRAINT "stock_item_section_width" CHECK ("stock_item"."section_width_mm" > 0),
	CONSTRAINT "stock_item_aspect_ratio" CHECK ("stock_item"."aspect_ratio" between 20 and 95),
	CONSTRAINT "stock_item_rim" CHECK ("stock_item"."rim_diameter_in" between 8 and 30),
	CONSTRAINT "stock_item_load_index" CHECK ("stock_item"."load_index" between 0 and 279),
	CONSTRAINT "stock_item_load_index_dual" CHECK ("stock_item"."load_index_dual" between 0 and 279 and "stock_item"."load_index_dual" <= "stock_item"."load_index"),
	CONSTRAINT "stock_item_speed" CHECK (length("stock_item"."speed_symbol") between 1 and 3 and "stock_item"."speed_rank" > 0),
	CONSTRAINT "stock_item_load_range" CHECK (("stock_item"."load_range" is null) = ("stock_item"."load_range_ply" is null) and "stock_item"."load_range_ply" between 4 and 24),
	CONSTRAINT "stock_item_diameter" CHECK ("stock_item"."overall_diameter_mm" > 0),
	CONSTRAINT "stock_item_price" CHECK ("stock_item"."price_cents" >= 0),
	CONSTRAINT "stock_item_quantity" CHECK ("stock_item"."quantity_on_hand" >= 0)
);
--> statement-breakpoint
CREATE TABLE "tire_line" (
	"id" serial PRIMARY KEY NOT NULL,
	"brand_id" integer NOT NULL,
	"name" text NOT NULL,
	"season" text NOT NULL,
	"terrain" text NOT NULL,
	"mud_and_snow" boolean DEFAULT false NOT NULL,
	"three_peak" boolean DEFAULT false NOT NULL,
	"run_flat" boolean DEFAULT false NOT NULL,
	"utqg_treadwear" smallint,
	"utqg_traction" text,
	"utqg_temperature" text,
	"mileage_warranty_miles" integer,
	CONSTRAINT "tire_line_brand_name" UNIQUE("brand_id","name"),
	CONSTRAINT "tire_line_season" CHECK ("tire_line"."season" in ('all-season', 'all-weather', 'summer', 'winter')),
	CONSTRAINT "tire_line_terrain" CHECK ("tire_line"."terrain" in ('highway', 'all-terrain', 'mud-terrain')),
	CONSTRAINT "tire_line_traction" CHECK ("tire_line"."utqg_traction" in ('AA', 'A', 'B', 'C')),
	CONSTRAINT "tire_line_temperature" CHECK ("tire_line"."utqg_temperature" in ('A', 'B', 'C')),
	CONSTRAINT "tire_line_treadwear" CHECK ("tire_line"."utqg_treadwear" between 20 and 1500),
	CONSTRAINT "tire_line_utqg_complete" CHECK (("tire_line"."utqg_treadwear" is null) = ("tire_line"."utqg_traction" is null) and ("tire_line"."utqg_traction" is null) = ("tire_line"."utqg_temperature" is null)),
	CONSTRAINT "tire_line_warranty" CHECK ("tire_line"."mileage_warranty_miles" between 1 and 200000)
);
--> statement-breakpoint
ALTER TABLE "stock_item" ADD CONSTRAINT "stock_item_line_id_tire_line_id_fk" FOREIGN KEY ("line_id") REFERENCES "public"."tire_line"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "tire_line" ADD CONSTRAINT "tire_line_brand_id_brand_id_fk" FOREIGN KEY ("brand_id") REFERENCES "public"."brand"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "stock_item_finder_up" ON "stock_item" USING btree ("rim_diameter_in","service_type","construction","overall_diameter_mm","price_cents","sku" collate "C") WHERE not "stock_item"."retired";--> statement-breakpoint
CREATE INDEX "stock_item_finder_down" ON "stock_item" USING btree ("rim_diameter_in","service_type","construction","overall_diameter_mm" DESC NULLS FIRST,"price_cents","sku" collate "C") WHERE not "stock_item"."retired";--> statement-breakpoint
CREATE INDEX "stock_item_sku_plain_order" ON "stock_item" USING btree ("sku" collate "C") WHERE not "stock_item"."retired";--> statement-breakpoint
CREATE INDEX "stock_item_designation" ON "stock_item" USING btree ("designation") WHERE not "stock_item"."retired";--> statement-breakpoint
CREATE INDEX "stock_item_line" ON "stock_item" USING btree ("line_id");