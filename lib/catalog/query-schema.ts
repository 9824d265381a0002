import { z } from "zod";
import { optional, wholeNumberIn } from "@/lib/api/query-fields";

/** Rows a page holds when the query names no limit. */
export const DEFAULT_PAGE_SIZE = 50;

export const catalogQuerySchema = z.object({
  cursor: optional(z.string()),
  limit: optional(wholeNumberIn(1, 500)),
});
