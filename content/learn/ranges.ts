import type { SpeedSymbol } from "@/lib/tire";

/**
 * Everyday ranges used to narrow the lesson tables. They describe what is usually seen, not a rule
 * (common practice, from memory): the smallest car tires sit around 60, heavy light-truck tires
 * around 130; car and light-truck speed symbols start at L (120 km/h).
 */
export const CAR_LOAD_INDEX_RANGE = [60, 130] as const;

export const SLOWEST_ROAD_SPEED_SYMBOL: SpeedSymbol = "L";
