import { z } from "zod";
import { fitCardEmailAnswerSchema, fitCardEmailBodySchema, idempotencyHeaderSchema } from "@/lib/email/fit-card-email-input";
import { fitCardParamsSchema, newFitCardSchema, savedFitCardSchema } from "@/lib/fit-cards/card-input";
import { publicFitCardSchema } from "@/lib/fit-cards/read-card";
import { named, type ApiOperation } from "./operation";

/** Fit cards: saved comparisons with their own link. */
export const CARD_ROUTES: ApiOperation[] = [
  {
    method: "post",
    path: "/api/v1/fit-cards",
    tag: "Fit cards",
    summary: "Save a comparison as a Fit card",
    description: "The first size is the tire on the car; an unknown or retired SKU → 400; an unreadable size, or one with no overall diameter (11R22.5) → 422.",
    access: "customer",
    body: named("NewFitCard", newFitCardSchema),
    answers: [
      {
        status: 201,
        description: "Saved.",
        json: named("SavedFitCard", savedFitCardSchema),
        headers: { Location: { description: "The card's public page.", schema: z.url() } },
      },
    ],
    errors: ["unreadable", "unknown_load_index", "unknown_speed_symbol"],
  },
  {
    method: "get",
    path: "/api/v1/fit-cards/{slug}",
    tag: "Fit cards",
    summary: "A Fit card, never who made it",
    description: "Each tire is judged exactly as the finder judges it. Withdrawn or expired → 410 gone.",
    access: "public",
    params: fitCardParamsSchema,
    answers: [{ status: 200, description: "The card.", json: named("FitCard", publicFitCardSchema) }],
    errors: ["gone"],
  },
  {
    method: "delete",
    path: "/api/v1/fit-cards/{slug}",
    tag: "Fit cards",
    summary: "Withdraw a card (its author or staff)",
    access: "customer",
    params: fitCardParamsSchema,
    answers: [{ status: 204, description: "Withdrawn; the card then answers 410." }],
  },
  {
    method: "post",
    path: "/api/v1/fit-cards/{slug}/email",
    tag: "Fit cards",
    summary: "E-mail a card's link",
    description:
      "202 whether the e-mail service took it or not: a failed attempt is recorded and sending again with the same Idempotency-Key retries it, " +
      "never delivering one key for one card twice. A limited number per staff member per hour, then 429. A withdrawn card → 410.",
    access: "staff",
    params: fitCardParamsSchema,
    headers: z.object({
      "Idempotency-Key": idempotencyHeaderSchema.optional().describe("8–100 of A-Z a-z 0-9 . _ : - (a UUID made when the form opens, reused on retry)."),
    }),
    body: named("FitCardEmail", fitCardEmailBodySchema),
    answers: [{ status: 202, description: "The attempt, sent or failed.", json: named("FitCardEmailAttempt", fitCardEmailAnswerSchema) }],
    errors: ["gone", "rate_limited"],
  },
];
