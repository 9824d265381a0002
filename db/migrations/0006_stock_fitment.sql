CREATE TABLE "stock_fitment" (
	"id" serial PRIMARY KEY NOT NULL,
	"rim_diameter_in" double precision NOT NULL,
	"service_type" text NOT NULL,
	"construction" text NOT NULL,
	"run_flat" boolean NOT NULL,
	"overall_diameter_mm" double precision NOT NULL,
	"load_index" smallint NOT NULL,
	"load_index_dual" smallint,
	"speed_rank" smallint NOT NULL,
	"load_range_ply" smallint,
	"item_count" integer DEFAULT 0 NOT NULL,
	"in_stock_count" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "stock_fitment_facts" UNIQUE NULLS NOT DISTINCT("rim_diameter_in","service_type","construction","run_flat","overall_diameter_mm","load_index","load_index_dual","speed_rank","load_range_ply"),
	CONSTRAINT "stock_fitment_counts" CHECK (0 <= "stock_fitment"."in_stock_count" and "stock_fitment"."in_stock_count" <= "stock_fitment"."item_count")
);
--> statement-breakpoint
DROP INDEX "stock_item_finder_up";--> statement-breakpoint
DROP INDEX "stock_item_finder_down";--> statement-breakpoint
ALTER TABLE "stock_item" ADD COLUMN "fitment_id" integer;--> statement-breakpoint
CREATE INDEX "stock_fitment_search" ON "stock_fitment" USING btree ("rim_diameter_in","service_type","construction","overall_diameter_mm");--> statement-breakpoint
ALTER TABLE "stock_item" ADD CONSTRAINT "stock_item_fitment_id_stock_fitment_id_fk" FOREIGN KEY ("fitment_id") REFERENCES "public"."stock_fitment"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "stock_item_fitment" ON "stock_item" USING btree ("fitment_id","price_cents","sku" collate "C","line_id","quantity_on_hand","id") WHERE not "stock_item"."retired";--> statement-breakpoint
CREATE INDEX "stock_item_diameter" ON "stock_item" USING btree ("rim_diameter_in","service_type","construction","overall_diameter_mm","price_cents","sku" collate "C","fitment_id","line_id","quantity_on_hand","id") WHERE not "stock_item"."retired";