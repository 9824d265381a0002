import Link from "next/link";
import type { CardState, CardSummary } from "@/lib/fit-cards/queries";
import { RevokeCardButton } from "./revoke-card-button";
import { formatDay } from "@/lib/format/format";

const stateText: Record<CardState, string> = { active: "Active", withdrawn: "Withdrawn", expired: "Expired" };

type ListedCard = CardSummary & { authorEmail?: string | null };

/** Saved Fit cards, newest first, each with its link and, while active, a way to withdraw it. */
export function CardList({ cards, emptyText, timeZone }: { cards: ListedCard[]; emptyText: string; timeZone: string }) {
  if (cards.length === 0) return <p className="rounded border border-dashed border-rule p-6 text-ink-soft">{emptyText}</p>;
  return (
    <ul className="divide-y divide-rule rounded border border-rule bg-sheet">
      {cards.map((card) => {
        const label = card.sizes.join(", ");
        return (
          <li key={card.slug} className="grid gap-2 p-4 sm:grid-cols-[1fr_auto] sm:items-start">
            <div className="min-w-0">
              <p className="font-mono font-semibold break-words">{label}</p>
              <p className="text-sm text-ink-soft">
                Saved {formatDay(card.createdAt, { timeZone })} · {card.tireCount} {card.tireCount === 1 ? "tire" : "tires"} ·{" "}
                <span className={card.state === "active" ? "font-semibold text-ink" : ""}>{stateText[card.state]}</span>
                {card.state === "active" && card.expiresAt ? ` until ${formatDay(card.expiresAt, { timeZone })}` : ""}
                {card.authorEmail !== undefined ? ` · by ${card.authorEmail ?? "a removed account"}` : ""}
              </p>
              {card.note ? <p className="mt-1 line-clamp-2 text-sm">{card.note}</p> : null}
            </div>
            <div className="flex flex-wrap items-start gap-2">
              <Link href={`/s/${card.slug}`} prefetch={false} className="inline-flex min-h-11 items-center px-1 font-semibold text-accent underline underline-offset-4">
                Open<span className="sr-only"> the card for {label}</span>
              </Link>
              {card.state === "active" ? <RevokeCardButton slug={card.slug} label={label} /> : null}
            </div>
          </li>
        );
      })}
    </ul>
  );
}
