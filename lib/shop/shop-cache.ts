import { revalidateTag, unstable_cache } from "next/cache";
import { PHASE_PRODUCTION_BUILD } from "next/constants";
import { getDb } from "@/lib/database/app-database";
import { readFinderShopSettings } from "./charges";
import { getShopContact, type ShopContact } from "./queries";

/**
 * What the app keeps of the shop between requests carries this tag, and so does every page that
 * shows it (Next.js adds a cached read's tags to the page): a change of the shop's settings
 * expires them all at once (`expireShopCache`), never a timer.
 */
export const SHOP_CACHE_TAG = "shop";

const cachedContact = unstable_cache(async () => getShopContact(await getDb()), ["shop-contact"], { tags: [SHOP_CACHE_TAG] });

const cachedFinderSettings = unstable_cache(async () => readFinderShopSettings(await getDb()), ["shop-finder-settings"], {
  tags: [SHOP_CACHE_TAG],
});

/**
 * The shop's contact for the footer of every page, from the cache. The build renders no contact
 * line: it never opens the database (PGlite allows one process per data folder, and the build runs
 * several), and the server's cache starts empty, so no page built then is served. Null when the
 * database cannot be reached, so no page fails for it.
 */
export async function readCachedShopContact(): Promise<ShopContact | null> {
  if (process.env.NEXT_PHASE === PHASE_PRODUCTION_BUILD) return null;
  try {
    return await cachedContact();
  } catch {
    return null;
  }
}

/** The shop's default tolerance and charges as a finder search reads them, from the cache. */
export function readCachedFinderShopSettings(): ReturnType<typeof readFinderShopSettings> {
  return cachedFinderSettings();
}

/** The shop's default diameter tolerance in percent, from the cache. */
export async function readCachedShopTolerance(): Promise<number> {
  return (await cachedFinderSettings()).tolerancePct;
}

/** Wear match's default limit in 32nds of an inch, from the cache. */
export async function readCachedShopWearLimit32(): Promise<number> {
  return (await cachedFinderSettings()).wearLimit32;
}

/** After a change of the shop's settings has committed: the next request reads the shop again. */
export function expireShopCache(): void {
  revalidateTag(SHOP_CACHE_TAG, { expire: 0 });
}
