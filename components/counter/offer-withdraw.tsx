"use client";

import { withdrawOffer } from "@/lib/offers/actions";
import { ConfirmAction } from "./confirm-action";

/** Withdraws an open offer after a confirmation; its link then tells the driver. */
export function OfferWithdraw({ offerId, requestId }: { offerId: number; requestId: number }) {
  return (
    <ConfirmAction
      label="Withdraw"
      question={`Withdraw offer #${offerId}? Its link will tell the driver it no longer holds. This cannot be undone.`}
      confirmLabel={`Yes, withdraw offer #${offerId}`}
      keepLabel="Keep it open"
      danger
      run={() => withdrawOffer({ id: offerId, requestId })}
    />
  );
}
