import { connection, NextResponse, type NextRequest } from "next/server";
import { getDb } from "@/db/client";
import { parseJsonBody } from "@/lib/api/body";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { createQuoteRequest } from "@/lib/quotes/create-request";
import { listQuoteRequests, requestListApiQuerySchema } from "@/lib/quotes/queries";
import { HONEYPOT_FIELD, quoteRequestSchema, SPAM_REFUSAL_MESSAGE, spamVerdict } from "@/lib/quotes/quote-input";
import { hitAddressLimit, hitEmailLimit } from "@/lib/quotes/request-limits";
import { clientAddress } from "@/lib/rate-limit/rate-limit";

function tooMany(retryAfterSeconds: number) {
  const minutes = Math.ceil(retryAfterSeconds / 60);
  return apiError(
    "rate_limited",
    `Too many requests were sent from here in a short time. Please try again in ${minutes} ${minutes === 1 ? "minute" : "minutes"}, or call the shop.`,
    { "Retry-After": String(retryAfterSeconds) },
  );
}

/**
 * "Ask the shop", public: 201 { id, status: "new" }. Limited per client address and per e-mail
 * address (429 with Retry-After); a filled-in hidden field or a form sent within seconds → 400.
 */
export async function POST(request: NextRequest): Promise<Response> {
  await connection();
  const db = await getDb();
  const byAddress = await hitAddressLimit(db, clientAddress(request.headers));
  if (!byAddress.allowed) return tooMany(byAddress.retryAfterSeconds);

  const parsed = await parseJsonBody(request, quoteRequestSchema);
  if (!parsed.ok) return parsed.response;
  const { [HONEYPOT_FIELD]: honeypot, fillMs, ...input } = parsed.value;
  if (!spamVerdict({ [HONEYPOT_FIELD]: honeypot, fillMs }).ok) return apiError("invalid_parameter", SPAM_REFUSAL_MESSAGE);

  const byEmail = await hitEmailLimit(db, input.email);
  if (!byEmail.allowed) return tooMany(byEmail.retryAfterSeconds);

  const created = await createQuoteRequest(db, input);
  return NextResponse.json({ id: created.id, status: created.status }, { status: 201 });
}

/**
 * Staff: `?status=new|answered|closed&page=N` → { requests, counts, total, page, pageCount },
 * newest first, 25 to a page; `page` past the last answers an empty list.
 */
export const GET = withRoute({ role: "staff", query: requestListApiQuerySchema }, async ({ db, query }) => {
  const listing = await listQuoteRequests(db, query);
  return NextResponse.json({
    ...listing,
    requests: listing.requests.map((row) => ({ ...row, createdAt: row.createdAt.toISOString() })),
  });
});
