import { asc, eq } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { brand, fitCard, fitCardTire, stockItem, tireLine } from "@/db/schema";
import { ofBrand, ofLine, ruleFactColumns } from "@/lib/catalog/columns";
import { readOriginal } from "@/lib/alternatives/original";
import { tireColumns, tireSchema, toTire } from "@/lib/catalog/catalog-tire";
import { SEASONS, type LoadRange } from "@/lib/tire";
import { cardTireVerdict, tireVerdictSchema } from "./tire-verdict";

/** A chosen tire as the public card shows it: live price and stock beside the price when saved. */
const cardTireSchema = tireSchema.extend(tireVerdictSchema.shape).extend({
  priceCentsAtSave: z.number().int(),
  stillStocked: z.boolean().describe("False once the item is retired (it then counts as not in stock)."),
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
  note: z.string().nullable(),
  tires: z.array(cardTireSchema),
});

export type CardTire = z.infer<typeof cardTireSchema>;
export type PublicFitCard = z.infer<typeof publicFitCardSchema>;

export type CardLookup = { status: "found"; card: PublicFitCard } | { status: "withdrawn"; why: "revoked" | "expired" } | { status: "missing" };

/** The card behind a link, or why there is none to show. */
export async function readFitCard(db: Database, slug: string, now = new Date()): Promise<CardLookup> {
  const [card] = await db.select().from(fitCard).where(eq(fitCard.slug, slug));
  if (!card) return { status: "missing" };
  if (card.revokedAt) return { status: "withdrawn", why: "revoked" };
  if (card.expiresAt && card.expiresAt <= now) return { status: "withdrawn", why: "expired" };

  const read = readOriginal({
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
      note: card.note,
      tires: rows.map((row) => ({
        ...toTire(row),
        inStock: !row.retired && row.quantityOnHand > 0,
        stillStocked: !row.retired,
        priceCentsAtSave: row.priceCentsAtSave,
        ...cardTireVerdict(original, row, card.tolerancePct),
      })),
    },
  };
}
