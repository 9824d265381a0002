import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { connection } from "next/server";
import { OfferView } from "@/components/offers/offer-view";
import { getDb } from "@/lib/database/app-database";
import { todayIn } from "@/lib/fittings";
import { offerTokenParamsSchema } from "@/lib/offers/offer-input";
import { SLOT_DAYS } from "@/lib/offers/offer-slots";
import { readPublicOffer } from "@/lib/offers/public-offer";
import { getShopContact } from "@/lib/shop/queries";

type Params = Promise<{ token: string }>;

// The link is the driver's key: no search engine may keep it.
export const metadata: Metadata = { title: "Your offer", robots: { index: false, follow: false } };

// Rendered per request: an offer's status and free times change as the driver and the shop act on it.
export default async function OfferPage({ params }: { params: Params }) {
  const { token } = await params;
  if (!offerTokenParamsSchema.safeParse({ token }).success) notFound();
  // Dynamic: the status, the stock and what may be cancelled change with every request's "now".
  await connection();
  const db = await getDb();
  const now = new Date();
  const [offer, shop] = await Promise.all([readPublicOffer(db, token, now), getShopContact(db)]);
  if (!offer) notFound();
  const canCancel = offer.cancelUntil !== null && now.getTime() < Date.parse(offer.cancelUntil);
  return <OfferView offer={offer} token={token} shop={shop} today={todayIn(offer.timeZone, now)} slotDays={SLOT_DAYS} canCancel={canCancel} />;
}
