import { z } from "zod";
import { decodeCursor, encodeCursor } from "@/lib/api/opaque-cursor";
import { lineText } from "@/lib/validation/text";

/** Where a catalog page ended: the last SKU in plain character order. */
const catalogCursorSchema = z.object({ after: lineText().min(1) });

export const encodeCatalogCursor = (afterSku: string): string => encodeCursor({ after: afterSku });
export const decodeCatalogCursor = (text: string): string | null => decodeCursor(text, catalogCursorSchema)?.after ?? null;
