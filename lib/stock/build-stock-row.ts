import { z } from "zod";
import type { NewStockItem } from "@/db/schema";
import {
  formatSize,
  hasNominalDiameter,
  isLoadRange,
  isSpeedSymbol,
  loadIndexKg,
  noDiameterMessage,
  plyRatingForLoadRange,
  serviceType,
  sizeFromSlug,
  sizeGeometry,
  speedSymbolRank,
} from "@/lib/tire";
import { lineText } from "@/lib/validation/text";
import { skuSchema } from "@/lib/validation/sku";

/** A stock item as staff screens, the CSV import and the demo seed describe it. */
export const stockItemInputSchema = z.object({
  sku: z.string().trim().pipe(skuSchema),
  designation: lineText().trim().min(1).max(100),
  loadIndex: z.number().int(),
  loadIndexDual: z.number().int().nullish(),
  speedSymbol: lineText().trim().min(1).max(8),
  loadRange: lineText().trim().min(1).max(2).nullish(),
  extraLoad: z.boolean().default(false),
  priceCents: z.number().int().min(0).max(2_147_483_647),
  quantity: z.number().int().min(0).max(2_147_483_647),
});

export type StockItemInput = z.input<typeof stockItemInputSchema>;

/** The line a stock item belongs to, as far as building its row needs it. */
export interface StockLine {
  id: number;
  runFlat: boolean;
}

export interface StockRowProblem {
  field: keyof StockItemInput;
  reason: string;
  /** A size that reads but that the catalog cannot hold (no overall diameter): the API answers 422, not 400. */
  unmeasurable?: true;
}

export type StockRowResult = { ok: true; row: NewStockItem } | { ok: false; problem: StockRowProblem };

const refuse = (field: keyof StockItemInput, reason: string): StockRowResult => ({ ok: false, problem: { field, reason } });

/**
 * Builds the row to store for one stock item: the designation is read by the tire core, stored
 * normalized and taken apart, and the overall diameter worked out. Anything the tire core cannot
 * read, or a combination no sidewall carries, is refused with the field to blame.
 */
export function buildStockRow(input: StockItemInput, line: StockLine): StockRowResult {
  const parsed = stockItemInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return refuse((issue?.path[0] ?? "sku") as keyof StockItemInput, issue?.message ?? "invalid");
  }
  const item = parsed.data;
  const size = sizeFromSlug(item.designation);
  if (!size) return refuse("designation", `"${item.designation}" is not a tire size`);
  if (!hasNominalDiameter(size)) {
    return { ok: false, problem: { field: "designation", reason: `${noDiameterMessage(size)} The finder compares tires by overall diameter, so the catalog cannot hold it`, unmeasurable: true } };
  }
  const service = serviceType(size);
  if (loadIndexKg(item.loadIndex) === undefined) return refuse("loadIndex", `${item.loadIndex} is not a load index (0–279)`);
  const dual = item.loadIndexDual ?? null;
  if (dual !== null) {
    if (loadIndexKg(dual) === undefined) return refuse("loadIndexDual", `${dual} is not a load index (0–279)`);
    if (dual > item.loadIndex) return refuse("loadIndexDual", "the dual load index cannot exceed the single one");
    if (service === "passenger") return refuse("loadIndexDual", "passenger tires carry no dual load index");
  }
  const speedSymbol = item.speedSymbol.toUpperCase();
  if (!isSpeedSymbol(speedSymbol)) return refuse("speedSymbol", `"${item.speedSymbol}" is not a speed symbol`);
  const loadRange = item.loadRange?.toUpperCase() ?? null;
  if (loadRange !== null && !isLoadRange(loadRange)) return refuse("loadRange", `"${item.loadRange}" is not a load range`);
  if (loadRange !== null && service === "passenger") return refuse("loadRange", "passenger tires are standard or extra load, not a load range");
  if (loadRange === null && service === "LT") return refuse("loadRange", "light-truck tires are marked with a load range");
  if (item.extraLoad && service !== "passenger") return refuse("extraLoad", "extra load (XL) applies to passenger tires only");

  return {
    ok: true,
    row: {
      sku: item.sku,
      lineId: line.id,
      designation: formatSize(size),
      sizeKind: size.kind,
      prefix: size.prefix,
      sectionWidthMm: size.sectionWidthMm,
      aspectRatio: size.aspectRatio,
      rimDiameterIn: size.rimDiameterIn,
      construction: size.construction,
      zr: size.zr,
      commercial: size.commercial,
      runFlat: size.runFlat || line.runFlat,
      loadIndex: item.loadIndex,
      loadIndexDual: dual,
      speedSymbol,
      speedRank: speedSymbolRank(speedSymbol),
      loadRange,
      loadRangePly: loadRange === null ? null : plyRatingForLoadRange(loadRange),
      extraLoad: item.extraLoad,
      serviceType: service,
      overallDiameterMm: sizeGeometry(size).overallDiameterMm,
      priceCents: item.priceCents,
      quantityOnHand: item.quantity,
    },
  };
}
