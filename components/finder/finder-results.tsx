"use client";

import type { DrawnTire } from "@/components/diagram/drawing-layout";
import type { UnitSystem } from "@/lib/tire";
import { MAX_CARD_TIRES } from "@/lib/fit-cards/card-limits";
import type { Candidate } from "@/lib/finder/alternatives-response";
import type { CandidateWear } from "@/lib/tire/wear-match-candidate";
import { AskBar } from "./ask-bar";
import { ResultCard } from "./result-card";
import type { useAlternatives } from "./use-alternatives";

interface FinderResultsProps {
  data: ReturnType<typeof useAlternatives>;
  original: DrawnTire | null;
  units: UnitSystem;
  picked: readonly string[];
  onPick: (sku: string, picked: boolean) => void;
  /** What ticking a result does, in the words of who is looking. */
  pickLabel: string;
  /** Opens Ask the shop with the picked tires (the phone's ask bar). */
  onAsk: () => void;
  /** Each result beside the tires that stay, when their depths are given. */
  wearOf: ((tire: Candidate) => CandidateWear) | null;
}

/** The qualifying tires, page by page, with the near misses folded away below. */
export function FinderResults({ data, original, units, picked, onPick, pickLabel, onAsk, wearOf }: FinderResultsProps) {
  const { first, results, error, isLoading, hasMore, isLoadingMore, loadMore, retry } = data;
  if (error) {
    return (
      <div role="alert" className="rounded border-l-4 border-danger bg-sheet p-4">
        <p className="font-semibold text-danger">{error.message}</p>
        <button type="button" onClick={() => retry()} className="mt-2 min-h-11 rounded border border-rule px-4 font-semibold">
          Try again
        </button>
      </div>
    );
  }
  if (isLoading || !first) {
    return (
      <p role="status" className="animate-pulse rounded border border-rule bg-sheet p-4 text-ink-soft">
        Looking through the shop&apos;s stock…
      </p>
    );
  }
  const nearMisses = first.nearMisses;
  return (
    <section aria-labelledby="results-heading" className="flex flex-col gap-3">
      <h2 id="results-heading" className="text-xl font-semibold" aria-live="polite">
        {first.total === 0
          ? "No tire in the catalog meets every rule"
          : `${first.total} equal-or-better ${first.total === 1 ? "tire" : "tires"} · within ±${first.tolerancePct} %`}
      </h2>
      {first.total === 0 ? (
        <p className="text-ink-soft">
          {nearMisses.length > 0 ? "Here is why the nearest ones fail. Try a wider tolerance or fewer filters, or ask the shop to order one in." : "Try a wider tolerance or fewer filters, or ask the shop to order one in."}
        </p>
      ) : null}
      <ol className="flex flex-col gap-3">
        {results.map((tire) => (
          <li key={tire.sku}>
            <ResultCard
              tire={tire}
              original={original}
              units={units}
              needed={first.quantity}
              wear={wearOf?.(tire)}
              pick={{ label: pickLabel, picked: picked.includes(tire.sku), disabled: picked.length >= MAX_CARD_TIRES, onChange: (on) => onPick(tire.sku, on) }}
            />
          </li>
        ))}
      </ol>
      {hasMore ? (
        <button type="button" onClick={() => loadMore()} disabled={isLoadingMore} className="min-h-11 self-center rounded border border-accent px-5 font-semibold text-accent disabled:opacity-60">
          {isLoadingMore ? "Loading…" : `Show more (${results.length} of ${first.total})`}
        </button>
      ) : null}
      {nearMisses.length > 0 ? (
        <details open={first.total === 0} className="rounded border border-rule p-4">
          <summary className="cursor-pointer font-semibold">
            {nearMisses.length} near {nearMisses.length === 1 ? "miss" : "misses"}: each fails one rule
          </summary>
          <ol className="mt-3 flex flex-col gap-3">
            {nearMisses.map((tire) => (
              <li key={tire.sku}>
                <ResultCard tire={tire} original={original} units={units} needed={first.quantity} />
              </li>
            ))}
          </ol>
        </details>
      ) : null}
      <AskBar picked={picked.length} onAsk={onAsk} />
    </section>
  );
}
