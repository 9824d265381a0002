import { asc } from "drizzle-orm";
import type { Database } from "@/db/client";
import { brand } from "@/db/schema";

/** Brand names for the finder's filter, alphabetically. */
export async function listBrandNames(db: Database): Promise<string[]> {
  const rows = await db.select({ name: brand.name }).from(brand).orderBy(asc(brand.name));
  return rows.map((row) => row.name);
}
