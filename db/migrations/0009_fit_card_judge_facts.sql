ALTER TABLE "fit_card" ADD COLUMN "load_index_dual" smallint;--> statement-breakpoint
ALTER TABLE "fit_card" ADD COLUMN "run_flat" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "fit_card" ADD COLUMN "min_load_index" smallint;--> statement-breakpoint
ALTER TABLE "fit_card" ADD COLUMN "min_load_index_dual" smallint;--> statement-breakpoint
ALTER TABLE "fit_card" ADD COLUMN "original_season" text;--> statement-breakpoint
ALTER TABLE "fit_card" ADD CONSTRAINT "fit_card_other_load_indices" CHECK (coalesce("fit_card"."load_index_dual", 0) between 0 and 279 and coalesce("fit_card"."min_load_index", 0) between 0 and 279 and coalesce("fit_card"."min_load_index_dual", 0) between 0 and 279);--> statement-breakpoint
ALTER TABLE "fit_card" ADD CONSTRAINT "fit_card_original_season" CHECK ("fit_card"."original_season" in ('all-season', 'all-weather', 'summer', 'winter'));