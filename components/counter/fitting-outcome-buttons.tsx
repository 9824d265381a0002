"use client";

import { fittingOutcomeWords } from "@/lib/offers/labels";
import { markFitting } from "@/lib/offers/actions";
import { FITTING_OUTCOMES } from "@/lib/tire";
import { ConfirmAction } from "./confirm-action";

/** Fitted, No-show, Cancelled for a booked fitting, each confirmed before it is saved. */
export function FittingOutcomeButtons({ offerId, requestId, who }: { offerId: number; requestId: number; who: string }) {
  return (
    <div className="flex flex-wrap gap-2" role="group" aria-label={`Mark the fitting for ${who}`}>
      {FITTING_OUTCOMES.map((outcome) => {
        const words = fittingOutcomeWords[outcome];
        return (
          <ConfirmAction
            key={outcome}
            label={words.label}
            question={words.confirm}
            confirmLabel={`Yes, mark ${words.label.toLowerCase()}`}
            keepLabel="Keep it booked"
            danger={outcome !== "fitted"}
            run={() => markFitting({ id: offerId, requestId, outcome })}
          />
        );
      })}
    </div>
  );
}
