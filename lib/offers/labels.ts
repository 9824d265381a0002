import type { FittingOutcome, OfferStatus } from "@/lib/tire";

/** An offer's status in the Counter's words. */
export const offerStatusLabels: Record<OfferStatus, string> = {
  open: "Open",
  accepted: "Fitting booked",
  expired: "Expired",
  withdrawn: "Withdrawn",
  cancelled: "Cancelled",
  "no-show": "No-show",
  fitted: "Fitted",
};

/** The buttons that mark a booked fitting, and what each does to the tires held for it. */
export const fittingOutcomeWords: Record<FittingOutcome, { label: string; confirm: string }> = {
  fitted: { label: "Fitted", confirm: "The tires were fitted: the held tires are sold and leave the count on hand. This cannot be undone." },
  "no-show": { label: "No-show", confirm: "The driver did not come: the held tires go back on sale. This cannot be undone." },
  cancelled: { label: "Cancelled", confirm: "The fitting is called off: the bay's time is free again and the held tires go back on sale. This cannot be undone." },
};
