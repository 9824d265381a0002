import type { Database } from "@/db/client";
import { shop } from "@/db/schema";
import { DEFAULT_TIME_ZONE, LOCALE } from "@/lib/format/format";
import { describeOpeningHours } from "./hours";

/** The columns of the shop's contact, which its settings include. */
export const contactColumns = {
  name: shop.name,
  streetAddress: shop.streetAddress,
  town: shop.town,
  region: shop.region,
  postalCode: shop.postalCode,
  phone: shop.phone,
  email: shop.email,
};

/** The shop's public face: what a customer may see in the footer, a Fit card or an e-mail. */
export async function getShopContact(db: Database): Promise<ShopContact | null> {
  const [row] = await db
    .select({ ...contactColumns, hours: shop.hours })
    .from(shop)
    .orderBy(shop.id)
    .limit(1);
  if (!row) return null;
  const { hours, ...contact } = row;
  return { ...contact, openingHours: describeOpeningHours(hours) };
}

export interface ShopContact {
  name: string;
  streetAddress: string;
  town: string;
  region: string;
  postalCode: string;
  phone: string;
  email: string;
  /** The week's opening hours in one line, from the shop's hours. */
  openingHours: string;
}

/**
 * The shop's time zone, which every date and time the Counter shows is written in; UTC before the
 * shop is set up, or if this runtime cannot format in the stored zone (a page never fails for it).
 */
export async function readShopTimeZone(db: Database): Promise<string> {
  const [row] = await db.select({ timeZone: shop.timeZone }).from(shop).orderBy(shop.id).limit(1);
  return row && canFormatIn(row.timeZone) ? row.timeZone : DEFAULT_TIME_ZONE;
}

function canFormatIn(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat(LOCALE, { timeZone });
    return true;
  } catch {
    return false;
  }
}
