import { AskTheShop } from "@/components/quotes/ask-the-shop";
import { fitCardQuoteTires, quoteCatalogTires } from "@/components/quotes/quote-tires";
import { PageIntro } from "@/components/ui/page-intro";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import { originalServiceWords, placardMinimumWords } from "@/lib/fit-cards/original-words";
import type { PublicFitCard } from "@/lib/fit-cards/read-card";
import type { ShopContact } from "@/lib/shop/queries";
import { formatDepth32, measurableSizeFromSlug, seasonTireWords, stayingTiresWords, type MeasurableSize } from "@/lib/tire";
import { FitCardComparison } from "./fit-card-comparison";
import { FitCardTires } from "./fit-card-tires";
import { ShareActions } from "./share-actions";
import { ShopCard } from "./shop-card";
import { formatDay } from "@/lib/format/format";

/** A Fit card as anyone with its link sees it: on screen, and on one printed page. */
export function FitCardView({ card, shop, url, timeZone }: { card: PublicFitCard; shop: ShopContact | null; url: string; timeZone: string }) {
  const { original } = card;
  const service = originalServiceWords(original);
  const placard = placardMinimumWords(original);
  const title = `Tires for ${original.designation}`;
  return (
    // Printed, the card fits one page: the print style sheet shrinks the type; here the drawing is capped and the tires sit three abreast.
    <article className="flex flex-col gap-6 print:gap-2 print:[&_svg]:max-h-[1.7in]">
      <PageIntro eyebrow="Fit card" title={title}>
        <p>
          The tire on the car: <span className="font-mono">{original.designation}</span>, load index and speed symbol{" "}
          <span className="font-mono">{service}</span>. Diameter tolerance ±{card.tolerancePct} %. Saved {formatDay(new Date(card.createdAt), { timeZone, long: true })}
          {card.expiresAt ? `, shown until ${formatDay(new Date(card.expiresAt), { timeZone, long: true })}` : ""}.
          {placard ? ` ${placard}` : ""}
          {original.season ? ` The tire on the car now is ${seasonTireWords(original.season)}.` : ""}
        </p>
      </PageIntro>
      <ShareActions url={url} title={`${title} · Fit card`} />
      {card.note ? (
        <section aria-labelledby="note-heading" className="rounded border-l-4 border-accent bg-accent-soft p-4">
          <h2 id="note-heading" className="font-semibold">
            A note from the shop
          </h2>
          <p className="mt-1 whitespace-pre-line">{card.note}</p>
        </section>
      ) : null}
      {card.wear ? (
        <section aria-labelledby="wear-heading" className="rounded border-l-4 border-caution bg-caution-soft p-4">
          <h2 id="wear-heading" className="font-semibold">
            All-wheel drive: the tires that stay
          </h2>
          <p className="mt-1">
            Depth left: {card.wear.remaining32.map(formatDepth32).join(", ")}. Any two tires on the vehicle may differ by at most {card.wear.limit32}/32 in of
            tread depth. Follow the vehicle maker&apos;s limit and have a qualified fitter measure before anything is fitted or shaved.
          </p>
        </section>
      ) : null}
      <FitCardComparison sizes={card.sizes.map(measurableSizeFromSlug).filter((size): size is MeasurableSize => size !== null)} />
      <FitCardTires tires={card.tires} needed={card.quantity} />
      <AskTheShop
        source="fit-card"
        reference={card.slug}
        tires={fitCardQuoteTires(card, card.wear ? stayingTiresWords(card.wear) : null)}
        catalogTires={quoteCatalogTires(card.tires.filter((tire) => tire.stillStocked))}
        quantity={card.quantity}
      />
      {shop ? <ShopCard shop={shop} /> : null}
      <SafetyCautions />
    </article>
  );
}
