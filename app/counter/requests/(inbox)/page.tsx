import type { Metadata } from "next";
import { connection } from "next/server";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { RequestList } from "@/components/counter/request-list";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { listQuoteRequests, requestListQuerySchema } from "@/lib/quotes/queries";
import { readShopTimeZone } from "@/lib/shop/queries";
import { latestOfferStatuses } from "@/lib/offers/queries";

export const metadata: Metadata = { title: "Requests · Counter", robots: { index: false } };

export default async function RequestsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePageUser("/counter/requests", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  const query = requestListQuerySchema.parse(await searchParams);
  await connection();
  const db = await getDb();
  const [listing, timeZone] = await Promise.all([listQuoteRequests(db, query), readShopTimeZone(db)]);
  const offerStatuses = await latestOfferStatuses(db, listing.requests.map((request) => request.id));
  return (
    <section>
      <PageIntro eyebrow="Counter · Staff" title="Price requests">
        <p>What drivers asked through “Ask the shop”, and customers recorded at the counter. Open one to reply by e-mail or send a priced offer.</p>
      </PageIntro>
      <RequestList listing={listing} query={query} timeZone={timeZone} offerStatuses={offerStatuses} />
    </section>
  );
}
