import { and, count, eq, gte, inArray, not } from "drizzle-orm";
import type { Database } from "@/db/client";
import { stockItem } from "@/db/schema";
import type { ServiceType } from "@/lib/tire";

export interface MatchCriteria {
  designations: string[];
  serviceType: ServiceType;
  minLoadIndex: number | null;
  minSpeedRank: number | null;
}

/** How many catalog tires of exactly each designation would serve: same service type, load and speed at least as given. */
export async function countCatalogMatches(db: Database, criteria: MatchCriteria): Promise<Map<string, number>> {
  if (criteria.designations.length === 0) return new Map();
  const rows = await db
    .select({ designation: stockItem.designation, matches: count() })
    .from(stockItem)
    .where(
      and(
        inArray(stockItem.designation, criteria.designations),
        eq(stockItem.serviceType, criteria.serviceType),
        not(stockItem.retired),
        criteria.minLoadIndex === null ? undefined : gte(stockItem.loadIndex, criteria.minLoadIndex),
        criteria.minSpeedRank === null ? undefined : gte(stockItem.speedRank, criteria.minSpeedRank),
      ),
    )
    .groupBy(stockItem.designation);
  return new Map(rows.map((row) => [row.designation, row.matches]));
}
