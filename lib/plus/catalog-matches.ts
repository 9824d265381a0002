import { and, eq, inArray, not } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem, tireLine } from "@/db/schema";
import { ofLine, ruleFactColumns } from "@/lib/catalog/columns";
import { judgedCandidate } from "@/lib/alternatives/judged-candidate";
import { tireStockColumns } from "@/lib/catalog/catalog-tire";
import { judgeCandidate, type JudgedOriginal } from "@/lib/tire";

/**
 * How many current catalog tires of exactly each designation meet rules 2–7 against the original,
 * each judged on a wheel of its own diameter (the Plus planner changes the rim on purpose).
 */
export async function countCatalogMatches(db: Database, original: JudgedOriginal, designations: string[], tolerancePct: number): Promise<Map<string, number>> {
  const matches = new Map<string, number>();
  if (designations.length === 0) return matches;
  const items = await db
    .select({ ...tireStockColumns, ...ruleFactColumns, season: tireLine.season })
    .from(stockItem)
    .innerJoin(tireLine, ofLine)
    .where(and(inArray(stockItem.designation, designations), eq(stockItem.serviceType, original.serviceType), not(stockItem.retired)));
  for (const item of items) {
    if (judgeCandidate(original, judgedCandidate(item), { tolerancePct, ownRim: true }).qualifies) {
      matches.set(item.designation, (matches.get(item.designation) ?? 0) + 1);
    }
  }
  return matches;
}
