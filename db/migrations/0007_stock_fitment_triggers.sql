-- Every stock row points at the fitment of its rule facts, and each fitment counts its current
-- items and those on hand. The database keeps both on every write, whichever path writes.

-- The rows already there get their fitments first, before the triggers exist to count them twice.
INSERT INTO "stock_fitment" ("rim_diameter_in", "service_type", "construction", "run_flat", "overall_diameter_mm", "load_index", "load_index_dual", "speed_rank", "load_range_ply", "item_count", "in_stock_count")
SELECT "rim_diameter_in", "service_type", "construction", "run_flat", "overall_diameter_mm", "load_index", "load_index_dual", "speed_rank", "load_range_ply",
       count(*) FILTER (WHERE NOT "retired"), count(*) FILTER (WHERE NOT "retired" AND "quantity_on_hand" > 0)
FROM "stock_item"
GROUP BY "rim_diameter_in", "service_type", "construction", "run_flat", "overall_diameter_mm", "load_index", "load_index_dual", "speed_rank", "load_range_ply";
--> statement-breakpoint
UPDATE "stock_item" AS item SET "fitment_id" = fitment."id"
FROM "stock_fitment" AS fitment
WHERE fitment."rim_diameter_in" = item."rim_diameter_in" AND fitment."service_type" = item."service_type"
  AND fitment."construction" = item."construction" AND fitment."run_flat" = item."run_flat"
  AND fitment."overall_diameter_mm" = item."overall_diameter_mm" AND fitment."load_index" = item."load_index"
  AND fitment."load_index_dual" IS NOT DISTINCT FROM item."load_index_dual" AND fitment."speed_rank" = item."speed_rank"
  AND fitment."load_range_ply" IS NOT DISTINCT FROM item."load_range_ply";
--> statement-breakpoint
CREATE FUNCTION "stock_item_find_fitment"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  FOR attempt IN 1..2 LOOP
    SELECT fitment."id" INTO NEW."fitment_id" FROM "stock_fitment" AS fitment
    WHERE fitment."rim_diameter_in" = NEW."rim_diameter_in" AND fitment."service_type" = NEW."service_type"
      AND fitment."construction" = NEW."construction" AND fitment."run_flat" = NEW."run_flat"
      AND fitment."overall_diameter_mm" = NEW."overall_diameter_mm" AND fitment."load_index" = NEW."load_index"
      AND fitment."load_index_dual" IS NOT DISTINCT FROM NEW."load_index_dual" AND fitment."speed_rank" = NEW."speed_rank"
      AND fitment."load_range_ply" IS NOT DISTINCT FROM NEW."load_range_ply";
    IF FOUND THEN RETURN NEW; END IF;
    -- New facts. Should another transaction add the same fitment meanwhile, the insert yields to
    -- it and the second look finds it.
    INSERT INTO "stock_fitment" ("rim_diameter_in", "service_type", "construction", "run_flat", "overall_diameter_mm", "load_index", "load_index_dual", "speed_rank", "load_range_ply")
    VALUES (NEW."rim_diameter_in", NEW."service_type", NEW."construction", NEW."run_flat", NEW."overall_diameter_mm", NEW."load_index", NEW."load_index_dual", NEW."speed_rank", NEW."load_range_ply")
    ON CONFLICT ON CONSTRAINT "stock_fitment_facts" DO NOTHING
    RETURNING "id" INTO NEW."fitment_id";
    IF NEW."fitment_id" IS NOT NULL THEN RETURN NEW; END IF;
  END LOOP;
  RAISE EXCEPTION 'no fitment for stock item %', NEW."sku";
END
$$;
--> statement-breakpoint
CREATE TRIGGER "stock_item_fitment_on_insert" BEFORE INSERT ON "stock_item"
FOR EACH ROW EXECUTE FUNCTION "stock_item_find_fitment"();
--> statement-breakpoint
CREATE TRIGGER "stock_item_fitment_on_update" BEFORE UPDATE ON "stock_item"
FOR EACH ROW
WHEN ((OLD."rim_diameter_in", OLD."service_type", OLD."construction", OLD."run_flat", OLD."overall_diameter_mm", OLD."load_index", OLD."load_index_dual", OLD."speed_rank", OLD."load_range_ply", OLD."fitment_id")
  IS DISTINCT FROM (NEW."rim_diameter_in", NEW."service_type", NEW."construction", NEW."run_flat", NEW."overall_diameter_mm", NEW."load_index", NEW."load_index_dual", NEW."speed_rank", NEW."load_range_ply", NEW."fitment_id"))
EXECUTE FUNCTION "stock_item_find_fitment"();
--> statement-breakpoint
-- One pass per statement over the rows it wrote: each current row counts +1 as it is now and −1 as
-- it was. Fitments are locked in id order first, so that two writers never wait for each other in a circle.
CREATE FUNCTION "stock_fitment_count_changes"() RETURNS trigger LANGUAGE plpgsql AS $$
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
             count(*) FILTER (WHERE NOT "retired" AND "quantity_on_hand" > 0)::int AS "on_hand"
      FROM "new_rows" GROUP BY "fitment_id"
    ) AS written;
  END IF;
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    SELECT fitment_ids || array_agg("fitment_id"), item_changes || array_agg(-"items"), on_hand_changes || array_agg(-"on_hand")
    INTO fitment_ids, item_changes, on_hand_changes
    FROM (
      SELECT "fitment_id", count(*) FILTER (WHERE NOT "retired")::int AS "items",
             count(*) FILTER (WHERE NOT "retired" AND "quantity_on_hand" > 0)::int AS "on_hand"
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
--> statement-breakpoint
CREATE TRIGGER "stock_item_counted_on_insert" AFTER INSERT ON "stock_item"
REFERENCING NEW TABLE AS "new_rows" FOR EACH STATEMENT EXECUTE FUNCTION "stock_fitment_count_changes"();
--> statement-breakpoint
CREATE TRIGGER "stock_item_counted_on_update" AFTER UPDATE ON "stock_item"
REFERENCING OLD TABLE AS "old_rows" NEW TABLE AS "new_rows" FOR EACH STATEMENT EXECUTE FUNCTION "stock_fitment_count_changes"();
--> statement-breakpoint
CREATE TRIGGER "stock_item_counted_on_delete" AFTER DELETE ON "stock_item"
REFERENCING OLD TABLE AS "old_rows" FOR EACH STATEMENT EXECUTE FUNCTION "stock_fitment_count_changes"();
--> statement-breakpoint
-- TRUNCATE writes no rows to count: an emptied catalog has no fitments.
CREATE FUNCTION "stock_fitment_clear"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  DELETE FROM "stock_fitment";
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER "stock_item_truncated" AFTER TRUNCATE ON "stock_item"
FOR EACH STATEMENT EXECUTE FUNCTION "stock_fitment_clear"();
