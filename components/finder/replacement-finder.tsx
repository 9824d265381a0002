"use client";

import dynamic from "next/dynamic";
import { useEffect, useMemo, useRef, useState } from "react";
import { drawnTireOf } from "@/components/reader/drawn-tire";
import { useUnitSystem } from "@/components/units/use-unit-system";
import { UnitsToggle } from "@/components/units/units-toggle";
import type { FinderQuery } from "@/lib/finder/finder-query";
import { alternativesSearch, FINDER_PAGE_SIZE, finderSearch, setSizeOf } from "@/lib/finder/finder-state";
import type { OriginalReading } from "@/lib/finder/original-marking";
import { placardFor } from "@/lib/finder/placard-for";
import { readFinderWear, WEAR_SORT } from "@/lib/finder/finder-wear";
import { byWearMatch, candidateWear } from "@/lib/tire/wear-match-candidate";
import { candidateWearWords, stayingTiresWords } from "@/lib/tire/wear-match-words";
import { SaveFitCard } from "@/components/fit-card/save-fit-card-button";
import { AskTheShop, type AskTheShopHandle } from "@/components/quotes/ask-the-shop";
import { finderQuoteTires, quoteCatalogTires } from "@/components/quotes/quote-tires";
import type { Candidate } from "@/lib/finder/alternatives-response";
import { FinderFilters } from "./finder-filters";
import { fitCardDraft } from "./fit-card-draft";
import { FinderResults } from "./finder-results";
import { OriginalSummary } from "./original-summary";
import { pickLabel } from "./pick-words";
import { PlacardForm } from "./placard-form";
import { useAlternatives } from "./use-alternatives";
import { useStaffView } from "./use-staff-view";
import { WearPanel } from "./wear-panel";

// Staff only: fetched once the browser knows staff are looking, never by other visitors.
const RecordCustomer = dynamic(() => import("./record-customer").then((module) => module.RecordCustomer));

interface ReplacementFinderProps {
  initialQuery: FinderQuery;
  /** The tire on the car, read by the page from the same address. */
  original: OriginalReading;
  brands: string[];
  defaultTolerancePct: number;
  /** The shop's default limit between the tread depths of any two tires on an all-wheel-drive vehicle. */
  shopWearLimit32: number;
}

/** Equal-or-better tires for the current one, fetched from the public API as filters change. */
export function ReplacementFinder({ initialQuery, original, brands, defaultTolerancePct, shopWearLimit32 }: ReplacementFinderProps) {
  const [query, setQuery] = useState(initialQuery);
  const [units, setUnits] = useUnitSystem();
  const placard = useMemo(() => (original.ok ? placardFor(query, original.passengerTire, units) : null), [query, original, units]);
  const minimums = { loadIndex: placard?.minLoadIndex ?? null, loadIndexDual: placard?.minLoadIndexDual ?? null };
  const search = original.ok ? alternativesSearch(query, minimums) : null;
  const data = useAlternatives(search);
  const update = (patch: Partial<FinderQuery>) => setQuery((current) => ({ ...current, ...patch }));
  const [picked, setPicked] = useState<Candidate[]>([]);
  const staff = useStaffView();
  const askTheShop = useRef<AskTheShopHandle>(null);
  const wear = readFinderWear(query, shopWearLimit32);
  const staying = wear.on ? wear.staying : null;
  const wearOf = staying && data.first ? (tire: Candidate) => candidateWear(tire, data.first!.original.designation, staying) : null;
  // Sorted by tread depth, the list comes whole (up to the API's largest page) and is shown a dozen
  // at a time; beyond that page, Show more fetches the next.
  const [wearShown, setWearShown] = useState(FINDER_PAGE_SIZE);
  const wearSorted = wearOf && query.sort === WEAR_SORT ? byWearMatch(data.results, wearOf) : null;
  const list = wearSorted
    ? {
        ...data,
        results: wearSorted.slice(0, wearShown),
        hasMore: wearSorted.length > wearShown || data.hasMore,
        loadMore: () => {
          if (wearSorted.length <= wearShown) data.loadMore();
          setWearShown((shown) => shown + FINDER_PAGE_SIZE);
        },
      }
    : data;
  const quoteWear = staying && wearOf ? { staying: stayingTiresWords(staying), verdictOf: (tire: Candidate) => candidateWearWords(wearOf(tire)) } : null;
  const pick = (sku: string, on: boolean) =>
    setPicked((list) => (on ? [...list, ...data.results.filter((tire) => tire.sku === sku)] : list.filter((tire) => tire.sku !== sku)));

  useEffect(() => {
    const url = new URL(window.location.href);
    url.search = finderSearch(query);
    window.history.replaceState(window.history.state, "", url);
  }, [query]);

  if (!original.ok) {
    return (
      <p role="alert" className="rounded border-l-4 border-danger bg-sheet p-4">
        {original.message}
      </p>
    );
  }
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)] lg:items-start lg:gap-8">
      <div className="flex min-w-0 flex-col gap-4">
        <OriginalSummary original={original.marking} units={units} tolerancePct={data.first?.tolerancePct ?? query.tolerancePct ?? defaultTolerancePct} minimums={minimums} />
        <div className="flex justify-end">
          <UnitsToggle units={units} onChange={setUnits} />
        </div>
        <PlacardForm query={query} check={placard} originalLoadIndex={query.loadIndex} passengerTire={original.passengerTire} onChange={update} />
        <WearPanel query={query} wear={wear} sizeSlug={original.sizeSlug} onChange={update} />
      </div>
      <div className="flex min-w-0 flex-col gap-4">
        <FinderFilters query={query} brands={brands} defaultTolerancePct={defaultTolerancePct} onChange={update} />
        <FinderResults
          data={list}
          original={original.marking.size && original.marking.geometry ? drawnTireOf(original.marking.size, original.marking.geometry) : null}
          units={units}
          picked={picked.map((tire) => tire.sku)}
          onPick={pick}
          pickLabel={pickLabel(staff)}
          onAsk={() => askTheShop.current?.open()}
          wearOf={wearOf}
        />
        {data.first ? <SaveFitCard draft={fitCardDraft(data.first.original.designation, query, minimums, picked, data.first.tolerancePct, staying)} /> : null}
        {data.first ? (
          <AskTheShop ref={askTheShop} source="finder" tires={finderQuoteTires(data.first.original, picked, quoteWear)} catalogTires={quoteCatalogTires(picked)} quantity={setSizeOf(query)} />
        ) : null}
        {data.first && staff ? <RecordCustomer tires={finderQuoteTires(data.first.original, picked, quoteWear)} skus={picked.map((tire) => tire.sku)} quantity={setSizeOf(query)} /> : null}
      </div>
    </div>
  );
}
