import type { QuoteSource, QuoteStatus } from "@/db/schema";

export const statusLabels: Record<QuoteStatus, string> = { new: "New", answered: "Answered", offered: "Offered", closed: "Closed" };

export const sourceLabels: Record<QuoteSource, string> = {
  "fit-card": "Fit card",
  "size-sheet": "Size sheet",
  finder: "Replacement finder",
  compare: "Side-by-side",
  plus: "Plus planner",
  counter: "At the counter",
};

/** Where the request was sent from, as a link staff can open, when the page still exists. */
export function sourceHref(source: QuoteSource, reference: string | null): string | null {
  if (!reference) return null;
  if (source === "fit-card") return `/s/${encodeURIComponent(reference)}`;
  if (source === "size-sheet") return `/size/${encodeURIComponent(reference.replace(/\//g, "-"))}`;
  if (source === "compare") return `/compare?${new URLSearchParams({ sizes: reference })}`;
  if (source === "plus") return `/plus?${new URLSearchParams({ size: reference })}`;
  return null;
}
