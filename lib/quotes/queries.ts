import { asc, desc, eq, sql } from "drizzle-orm";
import { z } from "zod";
import type { Database } from "@/db/client";
import { emailSend, QUOTE_SOURCES, QUOTE_STATUSES, quoteReply, quoteRequest, type QuoteStatus } from "@/db/schema";

export const REQUEST_PAGE_SIZE = 25;

/**
 * `/counter/requests?status=…&page=…` and `GET /api/v1/quote-requests`: the Counter page drops
 * what makes no sense (an old link still opens); the API refuses it.
 */
export const requestListQuerySchema = z.object({
  status: z.enum(QUOTE_STATUSES).optional().catch(undefined),
  page: z.coerce.number().int().min(1).max(100_000).catch(1).default(1),
});
export const requestListApiQuerySchema = z.object({
  status: z.enum(QUOTE_STATUSES, { error: "use new, answered, offered or closed" }).optional(),
  page: z.coerce.number({ error: "use a whole number from 1" }).int().min(1).max(100_000).default(1),
});
export type RequestListQuery = z.infer<typeof requestListQuerySchema>;

export const requestIdSchema = z.coerce.number().int().min(1).max(2_147_483_647);

const summaryColumns = {
  id: quoteRequest.id,
  createdAt: quoteRequest.createdAt,
  name: quoteRequest.name,
  email: quoteRequest.email,
  vehicle: quoteRequest.vehicle,
  tires: quoteRequest.tires,
  quantity: quoteRequest.quantity,
  preferredDay: quoteRequest.preferredDay,
  source: quoteRequest.source,
  status: quoteRequest.status,
};

/** Requests newest first, one page at a time, with how many there are in each status. */
export async function listQuoteRequests(db: Database, query: RequestListQuery) {
  const where = query.status ? eq(quoteRequest.status, query.status) : undefined;
  const [requests, countRows] = await Promise.all([
    db
      .select(summaryColumns)
      .from(quoteRequest)
      .where(where)
      .orderBy(desc(quoteRequest.createdAt), desc(quoteRequest.id))
      .limit(REQUEST_PAGE_SIZE)
      .offset((query.page - 1) * REQUEST_PAGE_SIZE),
    db.select({ status: quoteRequest.status, count: sql<number>`count(*)::int` }).from(quoteRequest).groupBy(quoteRequest.status),
  ]);
  const counts = Object.fromEntries(QUOTE_STATUSES.map((status) => [status, countRows.find((row) => row.status === status)?.count ?? 0])) as Record<QuoteStatus, number>;
  const total = query.status ? counts[query.status] : QUOTE_STATUSES.reduce((sum, status) => sum + counts[status], 0);
  return { requests, counts, total, page: query.page, pageCount: Math.max(1, Math.ceil(total / REQUEST_PAGE_SIZE)) };
}

/** One request with every reply, who wrote it and how its e-mail went. */
export async function getQuoteRequest(db: Database, id: number) {
  const [request] = await db.select().from(quoteRequest).where(eq(quoteRequest.id, id));
  if (!request) return null;
  const replies = await db
    .select({
      id: quoteReply.id,
      createdAt: quoteReply.createdAt,
      authorName: quoteReply.authorName,
      body: quoteReply.body,
      emailStatus: emailSend.status,
      emailError: emailSend.error,
    })
    .from(quoteReply)
    .leftJoin(emailSend, eq(quoteReply.emailSendId, emailSend.id))
    .where(eq(quoteReply.requestId, id))
    .orderBy(asc(quoteReply.createdAt), asc(quoteReply.id));
  return { ...request, replies };
}

/** The 200 body of GET /api/v1/quote-requests: a listing with each request's time in ISO 8601. */
export const quoteRequestListSchema = z.object({
  requests: z.array(
    z.object({
      id: z.number().int(),
      createdAt: z.iso.datetime(),
      name: z.string(),
      email: z.string(),
      vehicle: z.string(),
      tires: z.string(),
      quantity: z.number().int(),
      preferredDay: z.iso.date().nullable(),
      source: z.enum(QUOTE_SOURCES),
      status: z.enum(QUOTE_STATUSES),
    }),
  ),
  counts: z.record(z.enum(QUOTE_STATUSES), z.number().int()).describe("How many requests there are in each status."),
  total: z.number().int().describe("Requests in the status asked for, or in all."),
  page: z.number().int(),
  pageCount: z.number().int(),
});

export type QuoteRequestList = z.infer<typeof quoteRequestListSchema>;

export type QuoteRequestListing = Awaited<ReturnType<typeof listQuoteRequests>>;
export type QuoteRequestSummary = QuoteRequestListing["requests"][number];
export type QuoteRequestDetail = NonNullable<Awaited<ReturnType<typeof getQuoteRequest>>>;
