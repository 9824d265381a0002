CREATE TABLE "offer" (
	"id" serial PRIMARY KEY NOT NULL,
	"token" text NOT NULL,
	"request_id" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sender_id" text,
	"status" text DEFAULT 'open' NOT NULL,
	"valid_until_date" date NOT NULL,
	"valid_until" timestamp with time zone NOT NULL,
	"message" text DEFAULT '' NOT NULL,
	"estimate" jsonb NOT NULL,
	"fitting_bay" smallint,
	"fitting_start" timestamp with time zone,
	"fitting_end" timestamp with time zone,
	"hold_until" timestamp with time zone,
	"hold_released_at" timestamp with time zone,
	"calendar_sequence" integer DEFAULT 0 NOT NULL,
	"reminder_sent_at" timestamp with time zone,
	CONSTRAINT "offer_token_unique" UNIQUE("token"),
	CONSTRAINT "offer_status" CHECK ("offer"."status" in ('open', 'accepted', 'withdrawn', 'cancelled', 'no-show', 'fitted')),
	CONSTRAINT "offer_fitting_booked" CHECK (("offer"."fitting_start" is null) = ("offer"."fitting_bay" is null) and ("offer"."fitting_start" is null) = ("offer"."fitting_end" is null) and ("offer"."fitting_start" is null) = ("offer"."hold_until" is null) and ("offer"."status" in ('open', 'withdrawn') or "offer"."fitting_start" is not null)),
	CONSTRAINT "offer_fitting_order" CHECK ("offer"."fitting_end" > "offer"."fitting_start" and "offer"."fitting_bay" >= 1)
);
--> statement-breakpoint
CREATE TABLE "offer_line" (
	"offer_id" integer NOT NULL,
	"position" smallint NOT NULL,
	"stock_item_id" integer NOT NULL,
	"quantity" smallint NOT NULL,
	"price_cents" integer NOT NULL,
	"estimate" jsonb NOT NULL,
	CONSTRAINT "offer_line_offer_id_position_pk" PRIMARY KEY("offer_id","position"),
	CONSTRAINT "offer_line_quantity" CHECK ("offer_line"."quantity" between 1 and 8),
	CONSTRAINT "offer_line_price" CHECK ("offer_line"."price_cents" >= 0)
);
--> statement-breakpoint
DROP INDEX "stock_item_fitment";--> statement-breakpoint
DROP INDEX "stock_item_diameter";--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "fitting_bays" smallint DEFAULT 2 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "fitting_minutes" smallint DEFAULT 60 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "lead_minutes" integer DEFAULT 120 NOT NULL;--> statement-breakpoint
ALTER TABLE "shop" ADD COLUMN "cancel_cutoff_hours" smallint DEFAULT 24 NOT NULL;--> statement-breakpoint
ALTER TABLE "stock_item" ADD COLUMN "held_quantity" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "offer" ADD CONSTRAINT "offer_request_id_quote_request_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."quote_request"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offer" ADD CONSTRAINT "offer_sender_id_user_id_fk" FOREIGN KEY ("sender_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offer_line" ADD CONSTRAINT "offer_line_offer_id_offer_id_fk" FOREIGN KEY ("offer_id") REFERENCES "public"."offer"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offer_line" ADD CONSTRAINT "offer_line_stock_item_id_stock_item_id_fk" FOREIGN KEY ("stock_item_id") REFERENCES "public"."stock_item"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "offer_request" ON "offer" USING btree ("request_id");--> statement-breakpoint
CREATE INDEX "offer_fitting_start" ON "offer" USING btree ("fitting_start");--> statement-breakpoint
CREATE UNIQUE INDEX "offer_fitting_bay_start" ON "offer" USING btree ("fitting_bay","fitting_start") WHERE "offer"."status" in ('accepted', 'fitted');--> statement-breakpoint
CREATE INDEX "offer_line_item" ON "offer_line" USING btree ("stock_item_id");--> statement-breakpoint
CREATE INDEX "stock_item_fitment" ON "stock_item" USING btree ("fitment_id","price_cents","sku" collate "C","line_id","quantity_on_hand","held_quantity","id") WHERE not "stock_item"."retired";--> statement-breakpoint
CREATE INDEX "stock_item_diameter" ON "stock_item" USING btree ("rim_diameter_in","service_type","construction","overall_diameter_mm","price_cents","sku" collate "C","fitment_id","line_id","quantity_on_hand","held_quantity","id") WHERE not "stock_item"."retired";--> statement-breakpoint
ALTER TABLE "shop" ADD CONSTRAINT "shop_fittings" CHECK ("shop"."fitting_bays" between 1 and 20 and "shop"."fitting_minutes" between 15 and 480 and "shop"."lead_minutes" between 0 and 20160 and "shop"."cancel_cutoff_hours" between 0 and 168);--> statement-breakpoint
ALTER TABLE "stock_item" ADD CONSTRAINT "stock_item_held" CHECK ("stock_item"."held_quantity" >= 0 and "stock_item"."held_quantity" <= "stock_item"."quantity_on_hand");--> statement-breakpoint
-- A fitment's in_stock_count now counts the items with a tire that is not held (lib/catalog/columns.ts,
-- sellableQuantity): no tire is held yet, so the counts already kept stay true.
CREATE OR REPLACE FUNCTION "stock_fitment_count_changes"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  fitment_ids integer[] := '{}';
  item_changes integer[] := '{}';
  on_hand_changes integer[] := '{}';
BEGIN
  IF TG_OP IN ('INSERT', 'UPDATE') THEN
    SELECT fitment_ids || array_agg("fitment_id"), item_changes || array_agg("items"), on_hand_changes || array_agg("on_hand")
    INTO fitment_ids, item_changes, on_hand_changes
    FROM (
      SELECT "fitment_id", count(*) FILTER (WHERE NOT "retired")::int AS "items",
             count(*) FILTER (WHERE NOT "retired" AND "quantity_on_hand" - "held_quantity" > 0)::int AS "on_hand"
      FROM "new_rows" GROUP BY "fitment_id"
    ) AS written;
  END IF;
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    SELECT fitment_ids || array_agg("fitment_id"), item_changes || array_agg(-"items"), on_hand_changes || array_agg(-"on_hand")
    INTO fitment_ids, item_changes, on_hand_changes
    FROM (
      SELECT "fitment_id", count(*) FILTER (WHERE NOT "retired")::int AS "items",
             count(*) FILTER (WHERE NOT "retired" AND "quantity_on_hand" - "held_quantity" > 0)::int AS "on_hand"
      FROM "old_rows" GROUP BY "fitment_id"
    ) AS replaced;
  END IF;
  PERFORM 1 FROM "stock_fitment" WHERE "id" = ANY (fitment_ids) ORDER BY "id" FOR UPDATE;
  UPDATE "stock_fitment" AS fitment
  SET "item_count" = fitment."item_count" + change."items", "in_stock_count" = fitment."in_stock_count" + change."on_hand"
  FROM (
    SELECT "fitment_id", sum("items")::int AS "items", sum("on_hand")::int AS "on_hand"
    FROM unnest(fitment_ids, item_changes, on_hand_changes) AS c("fitment_id", "items", "on_hand")
    GROUP BY "fitment_id"
  ) AS change
  WHERE fitment."id" = change."fitment_id" AND (change."items" <> 0 OR change."on_hand" <> 0);
  RETURN NULL;
END
$$;
