import { and, eq, inArray } from "drizzle-orm";
import type { Database } from "@/db/client";
import { fitCard, fitCardTire, stockItem } from "@/db/schema";
import type { ApiErrorCode } from "@/lib/api/errors";
import { readOriginal } from "@/lib/alternatives/original";
import { readShopTolerance } from "@/lib/shop/tolerance";
import { formatSize, hasNominalDiameter, noDiameterMessage, notASizeMessage, sizeFromSlug } from "@/lib/tire";
import type { NewFitCard } from "./card-input";
import { newFitCardSlug } from "./slug";

export type CreateCardResult = { ok: true; slug: string } | { ok: false; code: ApiErrorCode; message: string };

const DAY_MS = 24 * 60 * 60 * 1000;

/** Saves a card and its chosen tires (with today's prices) in one transaction. */
export async function createFitCard(db: Database, authorId: string, input: NewFitCard): Promise<CreateCardResult> {
  const designations: string[] = [];
  for (const text of input.sizes) {
    const size = sizeFromSlug(text);
    if (!size) return { ok: false, code: "unreadable", message: notASizeMessage(text) };
    if (!hasNominalDiameter(size)) return { ok: false, code: "unreadable", message: noDiameterMessage(size) };
    designations.push(formatSize(size));
  }
  const original = readOriginal({ ...input, size: input.sizes[0]!, season: input.originalSeason });
  if (!original.ok) return { ok: false, code: original.code, message: original.message };
  const { original: read } = original;

  return db.transaction(async (tx) => {
    const items = input.skus.length
      ? await tx
          .select({ id: stockItem.id, sku: stockItem.sku, priceCents: stockItem.priceCents })
          .from(stockItem)
          .where(and(inArray(stockItem.sku, input.skus), eq(stockItem.retired, false)))
      : [];
    const missing = input.skus.filter((sku) => !items.some((item) => item.sku === sku));
    if (missing.length > 0) {
      return { ok: false, code: "invalid_parameter", message: `The catalog has no current item with the SKU ${missing.map((sku) => `"${sku}"`).join(", ")}.` };
    }
    const slug = newFitCardSlug();
    const [card] = await tx
      .insert(fitCard)
      .values({
        slug,
        authorId,
        sizes: designations,
        loadIndex: read.loadIndex,
        loadIndexDual: read.loadIndexDual,
        speedSymbol: read.speedSymbol === "ZR" || read.speedSymbol === null ? input.speedSymbol.toUpperCase() : read.speedSymbol,
        loadRange: read.loadRange,
        runFlat: read.runFlat,
        minLoadIndex: read.minLoadIndex,
        minLoadIndexDual: read.minLoadIndexDual,
        originalSeason: read.season,
        tolerancePct: input.tolerancePct ?? (await readShopTolerance(tx)),
        note: input.note || null,
        wearRemaining32: input.wear?.remaining32 ?? null,
        wearLimit32: input.wear?.limit32 ?? null,
        expiresAt: input.expiresInDays ? new Date(Date.now() + input.expiresInDays * DAY_MS) : null,
      })
      .returning({ id: fitCard.id });
    if (!card) throw new Error("the card was not saved");
    const chosen = input.skus.map((sku, position) => {
      const item = items.find((candidate) => candidate.sku === sku)!;
      return { cardId: card.id, position, stockItemId: item.id, priceCentsAtSave: item.priceCents };
    });
    if (chosen.length > 0) await tx.insert(fitCardTire).values(chosen);
    return { ok: true, slug };
  });
}
