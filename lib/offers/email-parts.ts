import { safetySummary } from "@/content/safety";
import type { FrozenEstimate } from "@/db/schema";
import { type EmailBlock, paragraph } from "@/lib/email/email-message";
import { countOf, formatDateTime, formatDay } from "@/lib/format/format";
import { estimateRows } from "@/lib/money/estimate";
import { formatPrice } from "@/lib/money/money";
import { addressLine } from "@/lib/shop/address";
import type { ShopContact } from "@/lib/shop/queries";
import type { FittingFacts, OfferFacts, OfferLineFacts } from "./offer-facts";

/** The blocks and words the offer and fitting e-mails share. Pure. */

const HOUR_MS = 3_600_000;

/** "Dec 5, 2026, 9:00 AM EST (the shop's time, America/New_York)". */
export function fittingWhen(fitting: Pick<FittingFacts, "start">, timeZone: string): string {
  return `${formatDateTime(fitting.start, { timeZone })} (the shop's time, ${timeZone})`;
}

/** The last instant a driver may cancel on the offer page: the cut-off's hours before the start. */
export function cancelDeadline(fitting: Pick<FittingFacts, "start">, cancelCutoffHours: number): Date {
  return new Date(fitting.start.getTime() - cancelCutoffHours * HOUR_MS);
}

/** A date the shop chose (YYYY-MM-DD, a date in its zone) in words: "December 5, 2026". */
export function localDateWords(date: string): string {
  // Read at midnight UTC and written in UTC, so that no zone moves it to another day.
  return formatDay(`${date}T00:00:00Z`, { timeZone: "UTC", long: true });
}

/** "2 × Brand Line 225/65R17 102H, $182.99 each". */
export function lineWords(line: OfferLineFacts): string {
  return `${line.quantity} × ${line.label}, ${formatPrice(line.priceCents)} each`;
}

/** The frozen estimate, line by line with the total, as every breakdown words it. */
export function breakdownBlock(estimate: FrozenEstimate): EmailBlock {
  const rows = estimateRows(estimate, `Tires (${countOf(estimate.quantity, "tire")})`).map(([label, cents]): [string, string] => [label, formatPrice(cents)]);
  return { kind: "fields", rows: [...rows, ["Total", formatPrice(estimate.totalCents)]] };
}

export function shopBlock(shop: ShopContact): EmailBlock {
  return paragraph(shop.name, addressLine(shop), `Phone ${shop.phone} · ${shop.email}`, shop.openingHours);
}

/** Before a fitting: what to bring and how long it takes (common practice at tire counters). */
export function whatToBringBlocks(fitting: Pick<FittingFacts, "start" | "end">): EmailBlock[] {
  const minutes = Math.round((fitting.end.getTime() - fitting.start.getTime()) / 60_000);
  return [
    { kind: "heading", text: "Before you come" },
    {
      kind: "list",
      items: [
        "Bring the vehicle the tires are for, and the key to its locking wheel nuts if it has them.",
        `Allow about ${countOf(minutes, "minute")} at the shop.`,
        "If a warning light, a vibration or damage worries you, tell the fitter when you arrive.",
      ],
    },
  ];
}

/** How to cancel: on the offer page until the cut-off, else by phone. */
export function cancelWords(facts: Pick<OfferFacts, "shop" | "timeZone" | "cancelCutoffHours">, fitting: Pick<FittingFacts, "start">, now: Date): string {
  const deadline = cancelDeadline(fitting, facts.cancelCutoffHours);
  const phone = `phone ${facts.shop.name} at ${facts.shop.phone}`;
  if (now.getTime() < deadline.getTime()) {
    return `If your plans change, cancel on your offer page until ${formatDateTime(deadline, { timeZone: facts.timeZone })}; after that, ${phone}.`;
  }
  return `If your plans change, ${phone}: it is too late to cancel on the offer page.`;
}

/** The usual cautions: the placard, load index and speed rating, qualified fitters, the makers' guidance. */
export const cautionBlock: EmailBlock = { kind: "caution", text: safetySummary };
