import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { createQuoteRequest } from "@/lib/quotes/create-request";
import { spamVerdict } from "@/lib/quotes/form-token";
import { listQuoteRequests, requestListApiQuerySchema, type QuoteRequestList } from "@/lib/quotes/queries";
import { quoteRequestSchema, SPAM_REFUSAL_MESSAGE, type QuoteRequestCreated } from "@/lib/quotes/quote-input";
import { HONEYPOT_FIELD } from "@/lib/quotes/quote-limits";
import { hitAddressLimit, hitEmailLimit } from "@/lib/quotes/request-limits";

function tooMany(retryAfterSeconds: number) {
  const minutes = Math.ceil(retryAfterSeconds / 60);
  return apiError(
    "rate_limited",
    `Too many requests were sent from here in a short time. Please try again in ${minutes} ${minutes === 1 ? "minute" : "minutes"}, or call the shop.`,
    { "Retry-After": String(retryAfterSeconds) },
  );
}

/**
 * "Ask the shop", public: 201 { id, status: "new" }. Every request counts against its client address,
 * valid or not, and valid ones against their e-mail address (429 with Retry-After); a filled-in
 * hidden field, or a form token that is missing, forged, under 3 s or over a day old → neutral 400.
 */
export const POST = withRoute(
  {
    role: "public",
    body: quoteRequestSchema,
    limitByAddress: async (db, address) => {
      const verdict = await hitAddressLimit(db, address);
      return verdict.allowed ? null : tooMany(verdict.retryAfterSeconds);
    },
  },
  async ({ db, body }) => {
    const { [HONEYPOT_FIELD]: honeypot, renderedAt, ...input } = body;
    if (!spamVerdict({ [HONEYPOT_FIELD]: honeypot, renderedAt }).ok) return apiError("invalid_parameter", SPAM_REFUSAL_MESSAGE);

    const byEmail = await hitEmailLimit(db, input.email);
    if (!byEmail.allowed) return tooMany(byEmail.retryAfterSeconds);

    const created = await createQuoteRequest(db, input);
    const answer: QuoteRequestCreated = { id: created.id, status: created.status };
    return NextResponse.json(answer, { status: 201 });
  },
);

/**
 * Staff: `?status=new|answered|closed&page=N` → { requests, counts, total, page, pageCount },
 * newest first, 25 to a page; `page` past the last answers an empty list.
 */
export const GET = withRoute({ role: "staff", query: requestListApiQuerySchema }, async ({ db, query }) => {
  const listing = await listQuoteRequests(db, query);
  const answer: QuoteRequestList = { ...listing, requests: listing.requests.map((row) => ({ ...row, createdAt: row.createdAt.toISOString() })) };
  return NextResponse.json(answer);
});
