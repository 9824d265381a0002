import { z } from "zod";
import { SKU_PATTERN, SKU_RULE } from "@/lib/tire/vocabulary";

/** A SKU as every request, form and address takes it (the rule itself lives in lib/tire/vocabulary). */
export const skuSchema = z.string().regex(SKU_PATTERN, SKU_RULE);
