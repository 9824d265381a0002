CREATE TABLE "fit_card" (
	"id" serial PRIMARY KEY NOT NULL,
	"slug" text NOT NULL,
	"author_id" text,
	"sizes" jsonb NOT NULL,
	"load_index" smallint NOT NULL,
	"speed_symbol" text NOT NULL,
	"load_range" text,
	"tolerance_pct" double precision NOT NULL,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"expires_at" timestamp with time zone,
	"revoked_at" timestamp with time zone,
	CONSTRAINT "fit_card_slug_unique" UNIQUE("slug"),
	CONSTRAINT "fit_card_tolerance" CHECK ("fit_card"."tolerance_pct" between 1 and 5),
	CONSTRAINT "fit_card_load_index" CHECK ("fit_card"."load_index" between 0 and 279),
	CONSTRAINT "fit_card_note" CHECK (length("fit_card"."note") <= 1000)
);
--> statement-breakpoint
CREATE TABLE "fit_card_tire" (
	"card_id" integer NOT NULL,
	"position" smallint NOT NULL,
	"stock_item_id" integer NOT NULL,
	"price_cents_at_save" integer NOT NULL,
	CONSTRAINT "fit_card_tire_card_id_position_pk" PRIMARY KEY("card_id","position"),
	CONSTRAINT "fit_card_tire_price" CHECK ("fit_card_tire"."price_cents_at_save" >= 0)
);
--> statement-breakpoint
ALTER TABLE "fit_card" ADD CONSTRAINT "fit_card_author_id_user_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fit_card_tire" ADD CONSTRAINT "fit_card_tire_card_id_fit_card_id_fk" FOREIGN KEY ("card_id") REFERENCES "public"."fit_card"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fit_card_tire" ADD CONSTRAINT "fit_card_tire_stock_item_id_stock_item_id_fk" FOREIGN KEY ("stock_item_id") REFERENCES "public"."stock_item"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "fit_card_author" ON "fit_card" USING btree ("author_id");