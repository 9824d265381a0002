import { NextResponse } from "next/server";
import { apiError } from "@/lib/api/errors";
import { withRoute } from "@/lib/auth/guard";
import { fitCardEmailBodySchema, idempotencyHeaderSchema, type FitCardEmailAnswer } from "@/lib/email/fit-card-email-input";
import { emailFitCard } from "@/lib/email/fit-card-email-request";
import { siteUrl } from "@/lib/env/site-url";
import { fitCardParamsSchema } from "@/lib/fit-cards/card-input";

/**
 * Staff e-mail a card's link → 202 { id, status: "sent", providerId }. When the e-mail service
 * refuses or cannot be reached, still 202 with { id, status: "failed", message }: the attempt is
 * recorded, and sending again with the same Idempotency-Key retries it without ever delivering twice.
 */
export const POST = withRoute({ role: "staff", params: fitCardParamsSchema, body: fitCardEmailBodySchema }, async ({ request, db, user, params, body }) => {
  const header = request.headers.get("idempotency-key");
  const clientKey = header === null ? null : idempotencyHeaderSchema.safeParse(header.trim());
  if (clientKey && !clientKey.success) {
    return apiError("invalid_parameter", "The Idempotency-Key header must be 8–100 letters, digits or - _ . : (a UUID works).");
  }
  const outcome = await emailFitCard(db, {
    sender: user,
    slug: params.slug,
    link: new URL(`/s/${params.slug}`, siteUrl()).toString(),
    body,
    clientKey: clientKey?.data ?? null,
  });
  switch (outcome.status) {
    case "missing":
      return apiError("not_found", "No Fit card has this address: check the link.");
    case "withdrawn":
      return apiError("gone", outcome.why === "revoked" ? "This Fit card was withdrawn, so it can't be e-mailed." : "This Fit card has expired, so it can't be e-mailed.");
    case "rate_limited":
      return apiError("rate_limited", `You have sent many Fit cards in the last hour. Try again in ${Math.ceil(outcome.retryAfterSeconds / 60)} minutes.`, {
        "Retry-After": String(outcome.retryAfterSeconds),
      });
    case "attempted": {
      const { result } = outcome;
      const answer: FitCardEmailAnswer = result.ok
        ? { id: result.id, status: "sent", providerId: result.providerId }
        : { id: result.id, status: "failed", message: result.message };
      return NextResponse.json(answer, { status: 202 });
    }
  }
});
