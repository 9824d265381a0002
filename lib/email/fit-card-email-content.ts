import { originalServiceWords } from "@/lib/fit-cards/original-words";
import type { PublicFitCard } from "@/lib/fit-cards/read-card";
import { formatPrice } from "@/lib/money/money";
import { addressLine } from "@/lib/shop/address";
import type { ShopContact } from "@/lib/shop/queries";
import { compareSizes, formatServiceDescription, formatSignedPercent, measurableSizeFromSlug, type MeasurableSize } from "@/lib/tire";

/** Everything a Fit card e-mail says, already worded, so the HTML and the text versions never differ. */
export interface FitCardEmailContent {
  subject: string;
  link: string;
  /** "225/45R17 91V", "LT265/75R16 123/120R, load range E", as printed. */
  original: string;
  otherSizes: { designation: string; diameterChange: string }[];
  tires: { name: string; marking: string; price: string }[];
  message: string | null;
  shop: { name: string; address: string; phone: string; email: string; hours: string } | null;
  caution: string;
}

export const FIT_CARD_EMAIL_CAUTION =
  "Before you buy, check the tire and loading placard on your vehicle and have the tires fitted by a qualified fitter: they, local rules and the makers' guidance come before this card.";

function tirePrice(tire: PublicFitCard["tires"][number]): string {
  if (!tire.stillStocked) return `${formatPrice(tire.priceCentsAtSave)} when saved, no longer stocked`;
  return `${formatPrice(tire.priceCents)} each today`;
}

export function fitCardEmailContent({ card, shop, link, message }: { card: PublicFitCard; shop: ShopContact | null; link: string; message?: string | null }): FitCardEmailContent {
  const { original } = card;
  const sizes = card.sizes.map(measurableSizeFromSlug).filter((size): size is MeasurableSize => size !== null);
  const compared = compareSizes(sizes);
  return {
    subject: `Your Fit card: tires for ${original.designation}`,
    link,
    original: `${original.designation} ${originalServiceWords(original)}`,
    otherSizes: compared.slice(1).map((size) => ({ designation: size.designation, diameterChange: `${formatSignedPercent(size.diameterDiffPct)} overall diameter` })),
    tires: card.tires.map((tire) => ({
      name: `${tire.brand} ${tire.line}`,
      marking: `${tire.designation} ${formatServiceDescription(tire)}${tire.extraLoad ? " XL" : ""}${tire.loadRange ? ` LR ${tire.loadRange}` : ""}`,
      price: tirePrice(tire),
    })),
    message: message?.trim() || null,
    shop: shop
      ? {
          name: shop.name,
          address: addressLine(shop),
          phone: shop.phone,
          email: shop.email,
          hours: shop.openingHours,
        }
      : null,
    caution: FIT_CARD_EMAIL_CAUTION,
  };
}
