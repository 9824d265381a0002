CREATE TABLE "email_send" (
	"id" serial PRIMARY KEY NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sender_id" text,
	"kind" text NOT NULL,
	"reference" text NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"idempotency_key" text NOT NULL,
	"status" text DEFAULT 'sending' NOT NULL,
	"provider_id" text,
	"error" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "email_send_idempotencyKey_unique" UNIQUE("idempotency_key")
);
--> statement-breakpoint
CREATE TABLE "quote_reply" (
	"id" serial PRIMARY KEY NOT NULL,
	"request_id" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"author_id" text,
	"author_name" text NOT NULL,
	"body" text NOT NULL,
	"email_send_id" integer
);
--> statement-breakpoint
CREATE TABLE "quote_request" (
	"id" serial PRIMARY KEY NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"name" text NOT NULL,
	"email" text NOT NULL,
	"phone" text,
	"vehicle" text NOT NULL,
	"tires" text NOT NULL,
	"quantity" smallint NOT NULL,
	"preferred_day" date,
	"source" text NOT NULL,
	"reference" text,
	"status" text DEFAULT 'new' NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rate_limit_hit" (
	"key" text NOT NULL,
	"window_start" timestamp with time zone NOT NULL,
	"hits" integer NOT NULL,
	CONSTRAINT "rate_limit_hit_key_window_start_pk" PRIMARY KEY("key","window_start")
);
--> statement-breakpoint
ALTER TABLE "email_send" ADD CONSTRAINT "email_send_sender_id_user_id_fk" FOREIGN KEY ("sender_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_reply" ADD CONSTRAINT "quote_reply_request_id_quote_request_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."quote_request"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_reply" ADD CONSTRAINT "quote_reply_author_id_user_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_reply" ADD CONSTRAINT "quote_reply_email_send_id_email_send_id_fk" FOREIGN KEY ("email_send_id") REFERENCES "public"."email_send"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "email_send_reference" ON "email_send" USING btree ("kind","reference");--> statement-breakpoint
CREATE INDEX "email_send_sender_created" ON "email_send" USING btree ("sender_id","created_at");--> statement-breakpoint
CREATE INDEX "quote_request_status_created" ON "quote_request" USING btree ("status","created_at");