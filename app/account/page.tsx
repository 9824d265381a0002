import type { Metadata } from "next";
import Link from "next/link";
import { CardList } from "@/components/fit-card/card-list";
import { PageIntro } from "@/components/ui/page-intro";
import { getDb } from "@/lib/database/app-database";
import { requirePageUser } from "@/lib/auth/page-user";
import { listOwnCards } from "@/lib/fit-cards/queries";
import { readShopTimeZone } from "@/lib/shop/queries";

export const metadata: Metadata = { title: "Your account", robots: { index: false } };

// Rendered per request: it is the signed-in person's own page, with their Fit cards.
export default async function AccountPage() {
  const { user } = await requirePageUser("/account", "customer");
  const db = await getDb();
  const [cards, timeZone] = await Promise.all([listOwnCards(db, user.id), readShopTimeZone(db)]);
  return (
    <section className="flex flex-col gap-8">
      <div>
        <PageIntro eyebrow="Account" title="Your account" />
        <dl className="grid max-w-md grid-cols-[auto_1fr] gap-x-6 gap-y-2 rounded border border-rule bg-sheet p-4">
          <dt className="font-semibold">Name</dt>
          <dd>{user.name}</dd>
          <dt className="font-semibold">E-mail</dt>
          <dd className="break-all">{user.email}</dd>
          <dt className="font-semibold">Role</dt>
          <dd>{user.role}</dd>
        </dl>
      </div>
      <section aria-labelledby="cards-heading" className="flex max-w-3xl flex-col gap-3">
        <h2 id="cards-heading" className="text-xl font-semibold">
          Your Fit cards
        </h2>
        <CardList
          cards={cards}
          timeZone={timeZone}
          emptyText="No Fit cards yet. Compare sizes in Side-by-side or pick tires in the Replacement finder, then choose “Save as Fit card”."
        />
        <p className="text-sm text-ink-soft">
          Start from <Link href="/compare" className="underline">Side-by-side</Link> or the{" "}
          <Link href="/replace" className="underline">Replacement finder</Link>.
        </p>
      </section>
    </section>
  );
}
