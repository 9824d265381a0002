import { asc, eq } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { brand, fitCard, fitCardTire, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine, ruleFactColumns } from "@/lib/catalog/columns";
import { readOriginal } from "@/lib/alternatives/original";
import { tireColumns, tireSchema, toTire } from "@/lib/catalog/catalog-tire";
import { DEFAULT_SET_SIZE, SEASONS, type LoadRange } from "@/lib/tire";
import { estimateSet } from "@/lib/money/estimate";
import { estimateSchema, readShopCharges } from "@/lib/shop/charges";
import { cardTireVerdict, tireVerdictSchema } from "./tire-verdict";
import { cardTireWear, cardWearSchema, stayingOnCard, tireWearSchema } from "./card-wear";

/** How many tires a card's estimates are for: a card keeps no set size, so a set of four. */
export const CARD_SET_SIZE = DEFAULT_SET_SIZE;

/** A chosen tire as the public card shows it: live price, stock and estimate beside the price when saved. */
const cardTireSchema = tireSchema.extend(tireVerdictSchema.shape).extend({
  priceCentsAtSave: z.number().int(),
  stillStocked: z.boolean().describe("False once the item is retired (it then counts as not in stock, quantity 0)."),
  estimate: estimateSchema.describe("What the card's quantity of this tire costs out the door at today's price: an estimate, which the shop confirms."),
  wear: tireWearSchema.nullable().describe("Beside the tires that stay on an all-wheel-drive vehicle, when the card was saved with their depths."),
});

/** GET /api/v1/fit-cards/{slug}: what anyone with the link may see; nothing about who made it. */
export const publicFitCardSchema = z.object({
  slug: z.string(),
  createdAt: z.iso.datetime(),
  expiresAt: z.iso.datetime().nullable(),
  sizes: z.array(z.string()).describe("As saved; the first is the tire on the car."),
  original: z.object({
    designation: z.string(),
    overallDiameterMm: z.number(),
    loadIndex: z.number().int(),
    loadIndexDual: z.number().int().nullable(),
    speedSymbol: z.string(),
    loadRange: z.string().nullable(),
    runFlat: z.boolean(),
    minLoadIndex: z.number().int().nullable().describe("The Placard check's minimum the card was saved with."),
    minLoadIndexDual: z.number().int().nullable(),
    season: z.enum(SEASONS).nullable(),
  }),
  tolerancePct: z.number(),
  quantity: z.number().int().describe("How many tires the estimates are for (a card keeps no set size: 4)."),
  note: z.string().nullable(),
  wear: cardWearSchema.nullable(),
  tires: z.array(cardTireSchema),
});

export type CardTire = z.infer<typeof cardTireSchema>;
export type PublicFitCard = z.infer<typeof publicFitCardSchema>;

/** The tire on the car a card was made for, as the judge reads it. */
export function readCardOriginal(card: typeof fitCard.$inferSelect) {
  return readOriginal({
    size: card.sizes[0] ?? "",
    loadIndex: card.loadIndex,
    loadIndexDual: card.loadIndexDual ?? undefined,
    speedSymbol: card.speedSymbol,
    loadRange: (card.loadRange ?? undefined) as LoadRange | undefined,
    runFlat: card.runFlat,
    minLoadIndex: card.minLoadIndex ?? undefined,
    minLoadIndexDual: card.minLoadIndexDual ?? undefined,
    season: card.originalSeason ?? undefined,
  });
}

export type CardLookup = { status: "found"; card: PublicFitCard } | { status: "withdrawn"; why: "revoked" | "expired" } | { status: "missing" };

/** The card behind a link, or why there is none to show. */
export async function readFitCard(db: Database, slug: string, now = new Date()): Promise<CardLookup> {
  const [card] = await db.select().from(fitCard).where(eq(fitCard.slug, slug));
  if (!card) return { status: "missing" };
  if (card.revokedAt) return { status: "withdrawn", why: "revoked" };
  if (card.expiresAt && card.expiresAt <= now) return { status: "withdrawn", why: "expired" };

  const read = readCardOriginal(card);
  if (!read.ok) throw new Error(`fit card ${card.id} holds an unreadable original: ${read.message}`);
  const { original } = read;
  const rows = await db
    .select({ ...tireColumns, ...ruleFactColumns, retired: stockItem.retired, priceCentsAtSave: fitCardTire.priceCentsAtSave })
    .from(fitCardTire)
    .innerJoin(stockItem, eq(fitCardTire.stockItemId, stockItem.id))
    .innerJoin(tireLine, ofLine)
    .innerJoin(brand, ofBrand)
    .where(eq(fitCardTire.cardId, card.id))
    .orderBy(asc(fitCardTire.position));
  const charges = rows.length > 0 ? await readShopCharges(db) : null;
  const staying = stayingOnCard(card);

  return {
    status: "found",
    card: {
      slug: card.slug,
      createdAt: card.createdAt.toISOString(),
      expiresAt: card.expiresAt?.toISOString() ?? null,
      sizes: card.sizes,
      original: {
        designation: original.designation,
        overallDiameterMm: original.overallDiameterMm,
        loadIndex: card.loadIndex,
        loadIndexDual: card.loadIndexDual,
        speedSymbol: card.speedSymbol,
        loadRange: card.loadRange,
        runFlat: original.runFlat,
        minLoadIndex: card.minLoadIndex,
        minLoadIndexDual: card.minLoadIndexDual,
        season: card.originalSeason,
      },
      tolerancePct: card.tolerancePct,
      quantity: CARD_SET_SIZE,
      note: card.note,
      wear: staying ? { remaining32: [...staying.remaining32], limit32: staying.limit32 } : null,
      tires: rows.map((row) => ({
        // Read now, never frozen: a retired item has none to sell.
        ...toTire({ ...row, quantity: row.retired ? 0 : row.quantity }),
        stillStocked: !row.retired,
        priceCentsAtSave: row.priceCentsAtSave,
        estimate: estimateSet(row.priceCents, CARD_SET_SIZE, charges!),
        ...cardTireVerdict(original, row, card.tolerancePct),
        wear: staying ? cardTireWear(toTire(row), original.designation, staying) : null,
      })),
    },
  };
}
