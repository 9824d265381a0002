import type { Database } from "@/db/client";
import { shop } from "@/db/schema";
import { getDb } from "@/lib/database/app-database";

/** The shop's public face: what a customer may see in the footer, a Fit card or an e-mail. */
export async function getShopContact(db: Database) {
  const [row] = await db
    .select({
      name: shop.name,
      streetAddress: shop.streetAddress,
      town: shop.town,
      region: shop.region,
      postalCode: shop.postalCode,
      phone: shop.phone,
      email: shop.email,
      openingHours: shop.openingHours,
    })
    .from(shop)
    .orderBy(shop.id)
    .limit(1);
  return row ?? null;
}

export type ShopContact = NonNullable<Awaited<ReturnType<typeof getShopContact>>>;

/** The shop's contact for the footer of every page; null when the database cannot be reached, so no page fails for it. */
export async function readShopContact(): Promise<ShopContact | null> {
  try {
    return await getShopContact(await getDb());
  } catch {
    return null;
  }
}
