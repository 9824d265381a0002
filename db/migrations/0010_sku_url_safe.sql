-- SKUs keep to characters that survive a URL path (A-Z a-z 0-9 - _ .), never "." or ".." alone and
-- never "new" in any case, so that every item opens at /counter/items/{sku}. Existing SKUs outside
-- that set get every other character replaced by "-" and, where that collides or lands on a reserved
-- name, a suffix "-2", "-3"…; each rename is written to the audit log.
ALTER TABLE "stock_item" DROP CONSTRAINT "stock_item_sku_shape";
--> statement-breakpoint
DO $$
DECLARE
  item record;
  base text;
  candidate text;
  suffix integer;
BEGIN
  FOR item IN
    SELECT "id", "sku" FROM "stock_item"
    WHERE NOT ("sku" ~ '^[A-Za-z0-9._-]{1,64}$' AND "sku" NOT IN ('.', '..') AND lower("sku") <> 'new')
    ORDER BY "sku" COLLATE "C", "id"
  LOOP
    base := left(regexp_replace(item."sku", '[^A-Za-z0-9._-]', '-', 'g'), 64);
    candidate := base;
    suffix := 1;
    WHILE candidate IN ('.', '..') OR lower(candidate) = 'new' OR EXISTS (SELECT 1 FROM "stock_item" WHERE "sku" = candidate) LOOP
      suffix := suffix + 1;
      candidate := left(base, 64 - length('-' || suffix)) || '-' || suffix;
    END LOOP;
    UPDATE "stock_item" SET "sku" = candidate, "updated_at" = now() WHERE "id" = item."id";
    INSERT INTO "audit_event" ("actor_id", "actor_email", "action", "subject", "changes", "summary")
    VALUES (NULL, 'Sidewise (database migration)', 'item_changed', candidate,
            jsonb_build_object('sku', jsonb_build_object('from', item."sku", 'to', candidate)),
            'SKU ' || item."sku" || ' → ' || candidate || ', so that the item opens at its own address');
  END LOOP;
END
$$;
--> statement-breakpoint
ALTER TABLE "stock_item" ADD CONSTRAINT "stock_item_sku_shape" CHECK ("stock_item"."sku" ~ '^[A-Za-z0-9._-]{1,64}$' and "stock_item"."sku" not in ('.', '..') and lower("stock_item"."sku") <> 'new');
