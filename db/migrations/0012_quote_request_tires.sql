CREATE TABLE "quote_request_tire" (
	"request_id" integer NOT NULL,
	"position" smallint NOT NULL,
	"stock_item_id" integer NOT NULL,
	CONSTRAINT "quote_request_tire_request_id_position_pk" PRIMARY KEY("request_id","position")
);
--> statement-breakpoint
ALTER TABLE "quote_request_tire" ADD CONSTRAINT "quote_request_tire_request_id_quote_request_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."quote_request"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_request_tire" ADD CONSTRAINT "quote_request_tire_stock_item_id_stock_item_id_fk" FOREIGN KEY ("stock_item_id") REFERENCES "public"."stock_item"("id") ON DELETE restrict ON UPDATE no action;