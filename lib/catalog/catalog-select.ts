import { eq } from "drizzle-orm";
import { brand, stockItem, tireLine } from "@/db/schema";

/** Join conditions from stock_item to its line and from the line to its brand. */
export const ofLine = eq(stockItem.lineId, tireLine.id);
export const ofBrand = eq(tireLine.brandId, brand.id);

/** What the rules read from a candidate, besides what a Tire shows. */
export const ruleFactColumns = { speedRank: stockItem.speedRank, loadRangePly: stockItem.loadRangePly };
