import { z } from "zod";
import { lineText } from "@/lib/validation/text";

export const ALTERNATIVES_SORTS = ["diameter", "price", "loadMargin"] as const;
export type AlternativesSort = (typeof ALTERNATIVES_SORTS)[number];

/** Where a page of alternatives ended: the last row's sort key, price and SKU (a total order). */
export interface AlternativesCursor {
  sort: AlternativesSort;
  key: number;
  priceCents: number;
  sku: string;
}

const alternativesCursorSchema = z.object({
  sort: z.enum(ALTERNATIVES_SORTS),
  key: z.number(),
  priceCents: z.number().int(),
  sku: lineText().min(1),
});

/** Where a catalog page ended: the last SKU in plain character order. */
const catalogCursorSchema = z.object({ after: lineText().min(1) });

function encode(value: unknown): string {
  return Buffer.from(JSON.stringify(value), "utf8").toString("base64url");
}

function decode<T>(text: string, schema: z.ZodType<T>): T | null {
  try {
    const parsed = schema.safeParse(JSON.parse(Buffer.from(text, "base64url").toString("utf8")));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

// JSON keeps every double exactly (shortest round-trip form), so the key compares equal in SQL again.
export const encodeAlternativesCursor = (cursor: AlternativesCursor): string => encode(cursor);
export const decodeAlternativesCursor = (text: string): AlternativesCursor | null => decode(text, alternativesCursorSchema);

export const encodeCatalogCursor = (afterSku: string): string => encode({ after: afterSku });
export const decodeCatalogCursor = (text: string): string | null => decode(text, catalogCursorSchema)?.after ?? null;
