import { formTokenAnswerSchema } from "@/lib/quotes/form-token";
import { quoteRequestListSchema, requestListApiQuerySchema } from "@/lib/quotes/queries";
import { quoteRequestCreatedSchema, quoteRequestSchema } from "@/lib/quotes/quote-input";
import { named, type ApiOperation } from "./operation";

/** Ask the shop: drivers' requests for a price. */
export const QUOTE_ROUTES: ApiOperation[] = [
  {
    method: "get",
    path: "/api/v1/quote-requests/form-token",
    tag: "Ask the shop",
    summary: "The signed renderedAt a request form posts back",
    access: "public",
    answers: [{ status: 200, description: "A fresh token.", json: named("FormToken", formTokenAnswerSchema) }],
  },
  {
    method: "post",
    path: "/api/v1/quote-requests",
    tag: "Ask the shop",
    summary: "Ask the shop for a price",
    description:
      "Stored, e-mailed to the shop and confirmed to the driver. The hidden website field must stay empty and renderedAt must be a token this server " +
      "signed, at least 3 s and at most a day old (else a neutral 400). Limited per client address (every request counts) and per e-mail address, then 429.",
    access: "public",
    body: named("QuoteRequest", quoteRequestSchema),
    answers: [{ status: 201, description: "Stored.", json: named("QuoteRequestCreated", quoteRequestCreatedSchema) }],
    errors: ["rate_limited"],
  },
  {
    method: "get",
    path: "/api/v1/quote-requests",
    tag: "Ask the shop",
    summary: "Requests, newest first, 25 a page",
    access: "staff",
    query: requestListApiQuerySchema,
    answers: [{ status: 200, description: "One page of requests and the count in each status.", json: named("QuoteRequestList", quoteRequestListSchema) }],
  },
];
