import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { EmailCardPanel } from "@/components/fit-card/email-card-panel";
import { FitCardView } from "@/components/fit-card/fit-card-view";
import { FitCardWithdrawn } from "@/components/fit-card/fit-card-withdrawn";
import { getDb } from "@/lib/database/app-database";
import { hasRole } from "@/lib/auth/roles";
import { getSessionUser } from "@/lib/auth/session";
import { listFitCardSends } from "@/lib/email/queries";
import { siteUrl } from "@/lib/env/site-url";
import { FIT_CARD_SLUG_PATTERN } from "@/lib/fit-cards/card-input";
import { readFitCard } from "@/lib/fit-cards/read-card";
import { getShopContact, readShopTimeZone } from "@/lib/shop/queries";

type Params = Promise<{ slug: string }>;

export const metadata: Metadata = { title: "Fit card", robots: { index: false } };

// Rendered per request: a Fit card's prices and stock are read as they are now.
export default async function FitCardPage({ params }: { params: Params }) {
  const { slug } = await params;
  if (!FIT_CARD_SLUG_PATTERN.test(slug)) notFound();
  const db = await getDb();
  const lookup = await readFitCard(db, slug);
  if (lookup.status === "missing") notFound();
  if (lookup.status === "withdrawn") return <FitCardWithdrawn why={lookup.why} />;
  const [shop, timeZone] = await Promise.all([getShopContact(db), readShopTimeZone(db)]);
  const viewer = await getSessionUser(await headers());
  // The public card never carries staff data: the staff panel is a separate section, rendered only for them.
  const staffPanel = viewer && hasRole(viewer.role, "staff") ? <EmailCardPanel slug={slug} sends={await listFitCardSends(db, slug)} timeZone={timeZone} /> : null;
  return (
    <>
      <FitCardView card={lookup.card} shop={shop} url={new URL(`/s/${slug}`, siteUrl()).toString()} timeZone={timeZone} />
      {staffPanel}
    </>
  );
}
