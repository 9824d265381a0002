import { and, eq, inArray, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { offer, offerLine, quoteRequest, stockItem } from "@/db/schema";
import { recordAudit, type Actor } from "@/lib/audit/record";
import { siteUrl } from "@/lib/env/site-url";
import { addLocalDays, endOfLocalDay, todayIn } from "@/lib/fittings";
import { formatPrice } from "@/lib/money/money";
import { estimatePackage, estimateSet, type Estimate } from "@/lib/money/estimate";
import { readShopCharges } from "@/lib/shop/charges";
import { readShopTimeZone } from "@/lib/shop/queries";
import { DEFAULT_VALID_DAYS, MAX_VALID_DAYS, type NewOffer } from "./offer-input";
import { newOfferToken } from "./token";

export interface SentOffer {
  id: number;
  token: string;
  url: string;
  estimate: Estimate;
}

export type OfferCreation =
  | { ok: true; offer: SentOffer }
  | { ok: false; code: "not_found" | "invalid"; field?: string; message: string };

/** The driver's page of an offer. */
export const offerUrl = (token: string): string => new URL(`/o/${token}`, siteUrl()).toString();

function validUntilProblem(validUntil: string, today: string): string | null {
  if (validUntil < today) return `validUntil ${validUntil} has passed: give today (${today}) or a later day`;
  if (validUntil > addLocalDays(today, MAX_VALID_DAYS)) return `an offer holds at most ${MAX_VALID_DAYS} days: give ${addLocalDays(today, MAX_VALID_DAYS)} or sooner`;
  return null;
}

/**
 * Sends a priced offer for a request: one package of catalog tires, priced now with the shop's
 * charges and frozen, valid until the end of a local date in the shop's zone. The offer, its lines,
 * the request's new status ("offered") and the audit entry land together. The e-mail is sent by the
 * caller once this has committed.
 */
export async function createOffer(db: Database, actor: Actor, requestId: number, input: NewOffer, now = new Date()): Promise<OfferCreation> {
  const timeZone = await readShopTimeZone(db);
  const today = todayIn(timeZone, now);
  const validUntilDate = input.validUntil ?? addLocalDays(today, DEFAULT_VALID_DAYS);
  const dateProblem = validUntilProblem(validUntilDate, today);
  if (dateProblem) return { ok: false, code: "invalid", field: "validUntil", message: dateProblem };

  const skus = input.lines.map((line) => line.sku);
  const items = await db
    .select({ id: stockItem.id, sku: stockItem.sku, priceCents: stockItem.priceCents })
    .from(stockItem)
    .where(and(inArray(stockItem.sku, skus), eq(stockItem.retired, false)));
  const missing = skus.filter((sku) => !items.some((item) => item.sku === sku));
  if (missing.length > 0) {
    return { ok: false, code: "invalid", field: "lines", message: `the catalog does not sell ${missing.join(", ")}: check the SKU, or add the item first` };
  }
  const charges = await readShopCharges(db);
  const lines = input.lines.map((line, position) => {
    const item = items.find((candidate) => candidate.sku === line.sku)!;
    return { position, stockItemId: item.id, sku: item.sku, quantity: line.quantity, priceCents: item.priceCents, estimate: estimateSet(item.priceCents, line.quantity, charges) };
  });
  const estimate = estimatePackage(lines, charges);
  const token = newOfferToken();

  const created = await db.transaction(async (tx) => {
    const [request] = await tx
      .update(quoteRequest)
      .set({ status: "offered", updatedAt: sql`now()` })
      .where(eq(quoteRequest.id, requestId))
      .returning({ id: quoteRequest.id, name: quoteRequest.name });
    if (!request) return null;
    const [row] = await tx
      .insert(offer)
      .values({
        token,
        requestId,
        senderId: actor.id,
        validUntilDate,
        validUntil: new Date(endOfLocalDay(validUntilDate, timeZone)),
        message: input.message ?? "",
        estimate,
      })
      .returning({ id: offer.id });
    await tx.insert(offerLine).values(lines.map(({ position, stockItemId, quantity, priceCents, estimate: lineEstimate }) => ({ offerId: row!.id, position, stockItemId, quantity, priceCents, estimate: lineEstimate })));
    const described = lines.map((line) => `${line.quantity} × ${line.sku}`).join(", ");
    await recordAudit(tx, actor, [
      {
        action: "offer_sent",
        subject: `request ${requestId}`,
        summary: `Offer ${row!.id} to ${request.name}: ${described}, ${formatPrice(estimate.totalCents)} out the door, valid until ${validUntilDate}`,
        changes: { status: { from: null, to: "open" } },
      },
    ]);
    return row!;
  });
  if (!created) return { ok: false, code: "not_found", message: "There is no such request." };
  return { ok: true, offer: { id: created.id, token, url: offerUrl(token), estimate } };
}
