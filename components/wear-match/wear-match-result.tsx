import { formatSize, sizeGeometry, wearVerdictSentence, type WearVerdict } from "@/lib/tire";
import type { WearMatchEvaluation } from "@/lib/wear-match/wear-match-api";
import { VehicleFromAbove } from "./vehicle-from-above";
import { WearArithmetic } from "./wear-arithmetic";

const VERDICT_HEADINGS: Record<WearVerdict, string> = {
  fitsAsIs: "Fits as it is",
  shave: "Shave the new tire first",
  replaceSet: "Replace the set",
};

const VERDICT_STYLES: Record<WearVerdict, string> = {
  fitsAsIs: "border-accent bg-accent-soft",
  shave: "border-caution bg-caution-soft",
  replaceSet: "border-danger bg-sheet",
};

/** The verdict in one sentence, the vehicle drawn from above and the arithmetic behind it. */
export function WearMatchResult({ answer }: { answer: Extract<WearMatchEvaluation, { ok: true }> }) {
  const { size, limit, limitFromShop, match } = answer;
  const sentence = wearVerdictSentence(match, limit);
  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="verdict-heading" className={`rounded border-l-4 p-4 ${VERDICT_STYLES[match.verdict]}`}>
        <p className="font-mono text-sm text-ink-soft">{formatSize(size)}</p>
        <h2 id="verdict-heading" className="text-xl font-semibold">
          {VERDICT_HEADINGS[match.verdict]}
        </h2>
        <p className="mt-1">{sentence}</p>
      </section>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <VehicleFromAbove match={match} sectionWidthMm={sizeGeometry(size).sectionWidthMm} description={sentence} />
        <WearArithmetic match={match} limit={limit} limitFromShop={limitFromShop} />
      </div>
    </div>
  );
}
