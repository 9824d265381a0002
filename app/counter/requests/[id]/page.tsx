import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { connection } from "next/server";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { RequestFields, RequestReplies } from "@/components/counter/request-detail";
import { RequestStatusBadge } from "@/components/counter/request-list";
import { RequestReplyForm } from "@/components/counter/request-reply-form";
import { RequestStatusButtons } from "@/components/counter/request-status-buttons";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { getQuoteRequest, requestIdSchema } from "@/lib/quotes/queries";
import { readShopTimeZone } from "@/lib/shop/queries";
import { readQuoteLines } from "@/lib/quotes/quote-lines";
import { RequestLines } from "@/components/counter/request-lines";
import { OfferComposer } from "@/components/counter/offer-composer";
import { RequestOffers } from "@/components/counter/request-offers";
import { addLocalDays, todayIn } from "@/lib/fittings";
import { DEFAULT_VALID_DAYS, MAX_LINE_QUANTITY, MAX_VALID_DAYS } from "@/lib/offers/offer-input";
import { offerTireOf } from "@/lib/offers/offer-tire";
import { listRequestOffers } from "@/lib/offers/queries";
import { readShopCharges } from "@/lib/shop/charges";

export const metadata: Metadata = { title: "Request · Counter", robots: { index: false } };

export default async function RequestPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: rawId } = await params;
  const access = await requirePageUser(`/counter/requests/${encodeURIComponent(rawId)}`, "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  const id = requestIdSchema.safeParse(rawId);
  if (!id.success || !/^\d+$/.test(rawId)) notFound();
  await connection();
  const db = await getDb();
  const [request, timeZone] = await Promise.all([getQuoteRequest(db, id.data), readShopTimeZone(db)]);
  if (!request) notFound();
  const [lines, offers, charges] = await Promise.all([readQuoteLines(db, request.id, request.quantity), listRequestOffers(db, request.id), readShopCharges(db)]);
  const today = todayIn(timeZone, new Date());
  const validDays = { today, standard: addLocalDays(today, DEFAULT_VALID_DAYS), latest: addLocalDays(today, MAX_VALID_DAYS) };
  return (
    <section className="flex flex-col gap-6">
      <Link href="/counter/requests" prefetch={false} className="inline-flex min-h-11 items-center self-start font-semibold text-accent underline underline-offset-4">
        ← All requests
      </Link>
      <PageIntro eyebrow={`Counter · Request #${request.id}`} title={`${request.name} asks for a price`}>
        <p>
          {request.quantity} × {request.tires}
        </p>
      </PageIntro>
      <div className="flex flex-wrap items-center gap-3">
        <span className="font-semibold">Status</span>
        <RequestStatusBadge status={request.status} />
      </div>
      <RequestStatusButtons requestId={request.id} status={request.status} />
      <RequestFields request={request} timeZone={timeZone} />
      <RequestLines lines={lines} quantity={request.quantity} />
      <section aria-labelledby="offers-heading" className="flex flex-col gap-3">
        <h2 id="offers-heading" className="text-xl font-semibold">
          Offers
        </h2>
        <RequestOffers offers={offers} timeZone={timeZone} />
        <h3 className="text-lg font-semibold">Price an offer</h3>
        <OfferComposer
          requestId={request.id}
          quantity={Math.min(request.quantity, MAX_LINE_QUANTITY)}
          namedTires={lines.filter((line) => line.stillStocked).map((line) => offerTireOf(line.tire))}
          charges={charges}
          validDays={validDays}
        />
      </section>
      <section aria-labelledby="replies-heading" className="flex flex-col gap-3">
        <h2 id="replies-heading" className="text-xl font-semibold">
          Replies
        </h2>
        <RequestReplies replies={request.replies} timeZone={timeZone} />
        <RequestReplyForm requestId={request.id} customerEmail={request.email} />
      </section>
    </section>
  );
}
