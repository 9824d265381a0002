-- A writer that knows each row's fitment (the catalog import resolves them for a whole file at once)
-- names it, and no row trigger looks it up again: the per-row lookup was most of a large import's
-- cost. A row written without one still gets it found or made, as before. Whatever a writer names is
-- checked once per statement against the rows it wrote, so no item can point at another's fitment.
DROP TRIGGER "stock_item_fitment_on_insert" ON "stock_item";
--> statement-breakpoint
CREATE TRIGGER "stock_item_fitment_on_insert" BEFORE INSERT ON "stock_item"
FOR EACH ROW WHEN (NEW."fitment_id" IS NULL) EXECUTE FUNCTION "stock_item_find_fitment"();
--> statement-breakpoint
DROP TRIGGER "stock_item_fitment_on_update" ON "stock_item";
--> statement-breakpoint
-- Facts changed and the fitment left as it was: find the fitment of the new facts.
CREATE TRIGGER "stock_item_fitment_on_update" BEFORE UPDATE ON "stock_item"
FOR EACH ROW
WHEN (NEW."fitment_id" IS NOT DISTINCT FROM OLD."fitment_id"
  AND (OLD."rim_diameter_in", OLD."service_type", OLD."construction", OLD."run_flat", OLD."overall_diameter_mm", OLD."load_index", OLD."load_index_dual", OLD."speed_rank", OLD."load_range_ply")
  IS DISTINCT FROM (NEW."rim_diameter_in", NEW."service_type", NEW."construction", NEW."run_flat", NEW."overall_diameter_mm", NEW."load_index", NEW."load_index_dual", NEW."speed_rank", NEW."load_range_ply"))
EXECUTE FUNCTION "stock_item_find_fitment"();
--> statement-breakpoint
CREATE FUNCTION "stock_item_fitment_check"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM 1 FROM "new_rows" AS item JOIN "stock_fitment" AS fitment ON fitment."id" = item."fitment_id"
  WHERE (item."rim_diameter_in", item."service_type", item."construction", item."run_flat", item."overall_diameter_mm", item."load_index", item."load_index_dual", item."speed_rank", item."load_range_ply")
    IS DISTINCT FROM (fitment."rim_diameter_in", fitment."service_type", fitment."construction", fitment."run_flat", fitment."overall_diameter_mm", fitment."load_index", fitment."load_index_dual", fitment."speed_rank", fitment."load_range_ply")
  LIMIT 1;
  IF FOUND THEN
    RAISE EXCEPTION 'a stock item names a fitment whose facts are not its own' USING ERRCODE = 'check_violation', CONSTRAINT = 'stock_item_fitment_facts';
  END IF;
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER "stock_item_fitment_checked_on_insert" AFTER INSERT ON "stock_item"
REFERENCING NEW TABLE AS "new_rows" FOR EACH STATEMENT EXECUTE FUNCTION "stock_item_fitment_check"();
--> statement-breakpoint
CREATE TRIGGER "stock_item_fitment_checked_on_update" AFTER UPDATE ON "stock_item"
REFERENCING NEW TABLE AS "new_rows" FOR EACH STATEMENT EXECUTE FUNCTION "stock_item_fitment_check"();
