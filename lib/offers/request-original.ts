import { eq } from "drizzle-orm";
import type { Database } from "@/db/client";
import { fitCard, type QuoteRequest } from "@/db/schema";
import { readOriginal, type Original } from "@/lib/alternatives/original";
import { readCardOriginal } from "@/lib/fit-cards/read-card";
import { formatSize, parseMarking, type LoadRange } from "@/lib/tire";

/**
 * The tire on the driver's car, when the request says it: a Fit card's original, else the first line
 * of the request's tires when it reads as a size with its service description ("Replacing
 * 225/65R17 102H", as the finder fills it in, or what staff typed for a walk-in). Null otherwise.
 */
export async function readRequestOriginal(db: Database, request: Pick<QuoteRequest, "source" | "reference" | "tires">): Promise<Original | null> {
  if (request.source === "fit-card" && request.reference) {
    const [card] = await db.select().from(fitCard).where(eq(fitCard.slug, request.reference));
    const read = card ? readCardOriginal(card) : null;
    if (read?.ok) return read.original;
  }
  return originalFromText(request.tires);
}

/** "Replacing LT265/75R16 123/120S, load range E" → that tire; null when the first line is no such marking. */
export function originalFromText(tires: string): Original | null {
  const [first = ""] = tires.split("\n");
  const [marking = "", loadRangeWords] = first.replace(/^\s*replacing\s+/i, "").split(",");
  const read = parseMarking(marking.trim());
  if (!read.ok || !read.size || !read.service) return null;
  const loadRange = /load range\s+([A-Z])\b/i.exec(loadRangeWords ?? "")?.[1]?.toUpperCase();
  const original = readOriginal({
    size: formatSize(read.size),
    loadIndex: read.service.loadIndex,
    loadIndexDual: read.service.loadIndexDual ?? undefined,
    speedSymbol: read.service.speedSymbol,
    loadRange: loadRange as LoadRange | undefined,
  });
  return original.ok ? original.original : null;
}
