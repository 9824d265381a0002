import type { Database } from "@/db/client";
import { and, eq, inArray } from "drizzle-orm";
import { quoteRequest, quoteRequestTire, stockItem } from "@/db/schema";
import { sendRecordedEmail } from "@/lib/email/recorded-send";
import { siteUrl } from "@/lib/env/site-url";
import { hitRateLimit } from "@/lib/rate-limit/rate-limit";
import { getShopContact } from "@/lib/shop/queries";
import type { NewQuoteRequest } from "./quote-input";
import { requestConfirmationEmail, requestToShopEmail, type RequestSummary } from "./quote-emails";

const CONFIRMATIONS_PER_ADDRESS_PER_DAY = { limit: 3, windowSeconds: 86_400 };

export interface CreatedQuoteRequest {
  id: number;
  status: "new";
  /** Whether each e-mail went out; a failure is recorded in the outbox and never loses the request. */
  emailed: { shop: boolean; customer: boolean };
}

/**
 * The catalog tires a request names, in the order given, each once; a SKU the catalog does not hold
 * now (retired since the page was opened, or never there) is left out rather than refusing the request.
 */
async function storeNamedTires(db: Database, requestId: number, skus: readonly string[]): Promise<void> {
  const unique = [...new Set(skus)];
  if (unique.length === 0) return;
  const items = await db
    .select({ id: stockItem.id, sku: stockItem.sku })
    .from(stockItem)
    .where(and(inArray(stockItem.sku, unique), eq(stockItem.retired, false)));
  const named = unique.flatMap((sku) => items.filter((item) => item.sku === sku));
  if (named.length === 0) return;
  await db.insert(quoteRequestTire).values(named.map((item, position) => ({ requestId, position, stockItemId: item.id })));
}

/** Stores a request and the catalog tires it names, together; sends nothing. */
export async function storeQuoteRequest(db: Database, input: NewQuoteRequest): Promise<{ id: number }> {
  return db.transaction(async (tx) => {
    const [stored] = await tx
      .insert(quoteRequest)
      .values({
        name: input.name,
        email: input.email,
        phone: input.phone ?? null,
        vehicle: input.vehicle,
        tires: input.tires,
        quantity: input.quantity,
        preferredDay: input.preferredDay ?? null,
        source: input.source,
        reference: input.reference ?? null,
      })
      .returning({ id: quoteRequest.id });
    if (!stored) throw new Error("the quote request was not stored");
    await storeNamedTires(tx, stored.id, input.skus ?? []);
    return stored;
  });
}

/**
 * Stores a driver's request, then e-mails it to the shop (replies go to the driver) and a
 * confirmation to the driver, at most 3 a day to one address, so that the form cannot be used to
 * flood someone else's inbox. The request is kept whatever happens to the e-mails.
 */
export async function createQuoteRequest(db: Database, input: NewQuoteRequest): Promise<CreatedQuoteRequest> {
  const row = await storeQuoteRequest(db, input);

  const summary: RequestSummary = { id: row.id, ...input, phone: input.phone ?? null, preferredDay: input.preferredDay ?? null };
  const shop = await getShopContact(db);
  const counterUrl = new URL(`/counter/requests/${row.id}`, siteUrl()).toString();
  const reference = String(row.id);

  const toShop = shop
    ? await sendRecordedEmail(db, {
        senderId: null,
        kind: "quote_to_shop",
        reference,
        to: shop.email,
        replyTo: input.email,
        message: requestToShopEmail(summary, counterUrl),
        idempotencyKey: `quote-request-${row.id}-to-shop`,
      })
    : { ok: false };
  const confirmationAllowed = await hitRateLimit(db, `quote-confirmation:${input.email.trim().toLowerCase()}`, CONFIRMATIONS_PER_ADDRESS_PER_DAY);
  if (!confirmationAllowed.allowed) return { id: row.id, status: "new", emailed: { shop: toShop.ok, customer: false } };
  const confirmation = await sendRecordedEmail(db, {
    senderId: null,
    kind: "quote_confirmation",
    reference,
    to: input.email,
    replyTo: shop?.email,
    message: requestConfirmationEmail(summary, shop),
    idempotencyKey: `quote-request-${row.id}-confirmation`,
  });
  return { id: row.id, status: "new", emailed: { shop: toShop.ok, customer: confirmation.ok } };
}
