import { offerStatusLabels } from "@/lib/offers/labels";
import type { OfferStatus } from "@/lib/tire";

const tone: Record<OfferStatus, string> = {
  open: "border-accent bg-accent-soft text-ink",
  accepted: "border-ink bg-sheet text-ink",
  fitted: "border-rule bg-sheet text-ink",
  expired: "border-rule bg-paper text-ink-soft",
  withdrawn: "border-rule bg-paper text-ink-soft",
  cancelled: "border-rule bg-paper text-ink-soft",
  "no-show": "border-caution bg-caution-soft text-ink",
};

/** An offer's status in words; `prefix` names what it is beside other badges ("Offer: Open"). */
export function OfferStatusBadge({ status, prefix }: { status: OfferStatus; prefix?: string }) {
  return (
    <span data-offer-status={status} className={`inline-block rounded border px-2 py-0.5 text-sm font-semibold ${tone[status]}`}>
      {prefix ? `${prefix} ` : ""}
      {offerStatusLabels[status]}
    </span>
  );
}
