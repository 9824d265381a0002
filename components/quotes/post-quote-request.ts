import { quoteFieldErrors, quoteRequestSchema } from "@/lib/quotes/quote-input";
import { HONEYPOT_FIELD } from "@/lib/quotes/quote-limits";
import type { QuoteSource } from "@/lib/tire";

export type QuoteOutcome =
  | { ok: true; id: number; email: string }
  | { ok: false; message: string; fieldErrors: Record<string, string> };

export interface QuoteContext {
  /** The page the form sits on; "counter" is staff recording a walk-in, never this form. */
  source: Exclude<QuoteSource, "counter">;
  reference?: string;
  /** The catalog tires the page names, by SKU. */
  skus?: string[];
}

const text = (form: FormData, name: string) => {
  const value = form.get(name);
  return typeof value === "string" ? value : undefined;
};

/** The signed time the server handed out when the form opened; null when it could not be reached (the send then says so). */
export async function fetchFormToken(): Promise<string | null> {
  try {
    const response = await fetch("/api/v1/quote-requests/form-token", { cache: "no-store" });
    const answer = (await response.json()) as { renderedAt?: unknown };
    return typeof answer.renderedAt === "string" ? answer.renderedAt : null;
  } catch {
    return null;
  }
}

/**
 * Checks the request in the browser with a message per field, then sends it to POST /api/v1/quote-requests
 * with the form's signed opening time.
 */
export async function postQuoteRequest(context: QuoteContext, form: FormData): Promise<QuoteOutcome> {
  const body = {
    name: text(form, "name"),
    email: text(form, "email"),
    phone: text(form, "phone"),
    vehicle: text(form, "vehicle"),
    tires: text(form, "tires"),
    quantity: text(form, "quantity")?.trim() || undefined,
    preferredDay: text(form, "preferredDay"),
    source: context.source,
    reference: context.reference,
    skus: context.skus && context.skus.length > 0 ? context.skus : undefined,
    [HONEYPOT_FIELD]: text(form, HONEYPOT_FIELD) ?? "",
    renderedAt: text(form, "renderedAt") || undefined,
  };
  const parsed = quoteRequestSchema.safeParse(body);
  if (!parsed.success) return { ok: false, message: "Some fields need another look.", fieldErrors: quoteFieldErrors(parsed.error) };
  try {
    const response = await fetch("/api/v1/quote-requests", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(parsed.data) });
    const answer = (await response.json().catch(() => null)) as { id?: number; error?: { message?: string } } | null;
    if (response.status === 201 && typeof answer?.id === "number") return { ok: true, id: answer.id, email: parsed.data.email };
    const message = answer?.error?.message ?? "The request could not be sent. Please try again, or call the shop.";
    const field = /field "(\w+)"/.exec(message)?.[1];
    return { ok: false, message, fieldErrors: field ? { [field]: message } : {} };
  } catch {
    return { ok: false, message: "The shop's server could not be reached. Check the connection and try again.", fieldErrors: {} };
  }
}
