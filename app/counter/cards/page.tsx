import type { Metadata } from "next";
import Link from "next/link";
import { CounterRefusal } from "@/components/counter/counter-refusal";
import { CardList } from "@/components/fit-card/card-list";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { CARD_LIST_PAGE_SIZE, cardListQuerySchema, listAllCards } from "@/lib/fit-cards/queries";
import { formatCount } from "@/lib/format/format";
import { readShopTimeZone } from "@/lib/shop/queries";

export const metadata: Metadata = { title: "Fit cards · Counter", robots: { index: false } };

export default async function CounterCardsPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePageUser("/counter/cards", "staff");
  if (!access.allowed) return <CounterRefusal user={access.user} needed="staff" />;
  const query = cardListQuerySchema.parse(await searchParams);
  const db = await getDb();
  const [{ cards, total }, timeZone] = await Promise.all([listAllCards(db, query), readShopTimeZone(db)]);
  const pages = Math.max(1, Math.ceil(total / CARD_LIST_PAGE_SIZE));
  const pageHref = (page: number) => `/counter/cards?${new URLSearchParams({ ...(query.q ? { q: query.q } : {}), page: String(page) })}`;
  return (
    <section className="flex flex-col gap-4">
      <PageIntro eyebrow="Counter" title="Fit cards">
        <p>Every saved card, newest first. Withdraw one when its prices or advice no longer hold.</p>
      </PageIntro>
      <form role="search" method="get" className="flex max-w-xl flex-wrap items-end gap-2">
        <div className="flex grow flex-col gap-1">
          <label htmlFor="card-search" className="font-semibold">
            Find a card by size, note or author
          </label>
          <input id="card-search" name="q" type="search" defaultValue={query.q ?? ""} className="min-h-11 rounded border border-rule bg-sheet px-3" />
        </div>
        <button type="submit" className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet">
          Search
        </button>
      </form>
      <p role="status" className="text-ink-soft">
        {total === 0 ? "" : `${formatCount(total)} ${total === 1 ? "card" : "cards"} · page ${query.page} of ${pages} · days in ${timeZone} (the shop's time)`}
      </p>
      <CardList cards={cards} emptyText={query.q ? "No card matches that search." : "No Fit cards have been saved yet."} timeZone={timeZone} />
      {pages > 1 ? (
        <nav aria-label="Card pages" className="flex gap-4">
          {query.page > 1 ? (
            <Link href={pageHref(query.page - 1)} prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
              Newer cards
            </Link>
          ) : null}
          {query.page < pages ? (
            <Link href={pageHref(query.page + 1)} prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
              Older cards
            </Link>
          ) : null}
        </nav>
      ) : null}
    </section>
  );
}
