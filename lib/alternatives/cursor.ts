import { z } from "zod";
import { decodeCursor, encodeCursor } from "@/lib/api/opaque-cursor";
import { FINDER_SORTS, type FinderSort } from "@/lib/tire";
import { lineText } from "@/lib/validation/text";

/** Where a page of alternatives ended: the last row's sort key, price and SKU (a total order). */
export interface AlternativesCursor {
  sort: FinderSort;
  key: number;
  priceCents: number;
  sku: string;
}

const alternativesCursorSchema = z.object({
  sort: z.enum(FINDER_SORTS),
  key: z.number(),
  priceCents: z.number().int(),
  sku: lineText().min(1),
});

// JSON keeps every double exactly (shortest round-trip form), so the key compares equal in SQL again.
export const encodeAlternativesCursor = (cursor: AlternativesCursor): string => encodeCursor(cursor);
export const decodeAlternativesCursor = (text: string): AlternativesCursor | null => decodeCursor(text, alternativesCursorSchema);
