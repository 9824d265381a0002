import Link from "next/link";
import type { PlusPlan } from "@/lib/plus/plus-request";
import { PickSize } from "./plus-picks";
import { formatLength, formatSignedPercent, sizeToSlug } from "@/lib/tire";

const groupTitle = (plus: number, rim: number) =>
  plus === 0 ? `Same ${rim}-inch wheels` : `${plus > 0 ? `Plus ${plus}` : "Minus 1"}: ${rim}-inch wheels`;

function signedMm(mm: number): string {
  const rounded = Math.round(mm);
  return rounded === 0 ? "same" : `${rounded > 0 ? "+" : "−"}${Math.abs(rounded)} mm`;
}

interface PlusGroupsProps {
  plan: PlusPlan;
  speedSymbol?: string;
}

/** Within a group, the sizes the shop stocks first; otherwise the plan's order (closest diameter first) stands. */
const stockedFirst = (candidates: PlusPlan["candidates"]) => [
  ...candidates.filter((candidate) => candidate.catalogMatches > 0),
  ...candidates.filter((candidate) => candidate.catalogMatches === 0),
];

/** The candidates, grouped from one inch smaller to three inches larger: sizes in the catalog first, then the rest, closest diameter first. */
export function PlusGroups({ plan, speedSymbol }: PlusGroupsProps) {
  const groups = [-1, 0, 1, 2, 3]
    .map((plus) => ({ plus, candidates: stockedFirst(plan.candidates.filter((candidate) => candidate.plus === plus)) }))
    .filter((group) => group.candidates.length > 0);
  return (
    <div className="flex flex-col gap-8">
      {groups.map(({ plus, candidates }) => (
        <section key={plus} aria-labelledby={`plus-${plus}`}>
          <h2 id={`plus-${plus}`} className="mb-2 text-xl font-semibold">
            {groupTitle(plus, candidates[0]!.rimDiameterIn)}
            <span className="ml-2 text-sm font-normal text-ink-soft">{candidates.length} sizes</span>
          </h2>
          <div className="overflow-x-auto" tabIndex={0} role="region" aria-labelledby={`plus-${plus}`}>
            <table className="w-full border-collapse text-sm">
              <thead>
                <tr className="text-left text-xs text-ink-soft">
                  <th scope="col" className="py-1 pr-3 font-semibold">Size</th>
                  <th scope="col" className="px-2 py-1 text-right font-semibold">Diameter</th>
                  <th scope="col" className="px-2 py-1 text-right font-semibold">Sidewall</th>
                  <th scope="col" className="px-2 py-1 text-right font-semibold">Rim width</th>
                  <th scope="col" className="px-2 py-1 text-right font-semibold">Load index at least</th>
                  <th scope="col" className="py-1 pl-2 text-right font-semibold">In the catalog</th>
                  <th scope="col" className="py-1 pl-2 text-right font-semibold">Pick</th>
                </tr>
              </thead>
              <tbody>
                {candidates.map((candidate) => {
                  const finder = new URLSearchParams({ size: sizeToSlug(candidate.size) });
                  if (candidate.minLoadIndex !== null) finder.set("loadIndex", String(candidate.minLoadIndex));
                  if (speedSymbol) finder.set("speedSymbol", speedSymbol);
                  const isOriginal = candidate.designation === plan.original.designation;
                  return (
                    <tr key={candidate.designation} className={`border-t border-rule ${isOriginal ? "bg-accent-soft" : ""}`}>
                      <th scope="row" className="py-1.5 pr-3 text-left font-mono font-normal whitespace-nowrap">
                        <Link href={`/size/${sizeToSlug(candidate.size)}`} className="text-accent underline underline-offset-4">
                          {candidate.designation}
                        </Link>
                        {isOriginal ? <span className="ml-2 font-sans text-xs text-ink-soft">current</span> : null}
                      </th>
                      <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">
                        {formatSignedPercent(candidate.diameterDiffPct)} <span className="text-ink-soft">({formatLength(candidate.overallDiameterMm, "metric")})</span>
                      </td>
                      <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{signedMm(candidate.sidewallMm - plan.original.sidewallMm)}</td>
                      <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{candidate.theoreticalRimWidthIn.toFixed(1)} in</td>
                      <td className="px-2 py-1.5 text-right font-mono">{candidate.minLoadIndex ?? "as placard"}</td>
                      <td className="py-1.5 pl-2 text-right whitespace-nowrap">
                        {candidate.catalogMatches > 0 ? (
                          <Link href={`/replace?${finder.toString()}`} className="font-semibold text-accent underline underline-offset-4">
                            {candidate.catalogMatches} {candidate.catalogMatches === 1 ? "tire" : "tires"}
                          </Link>
                        ) : (
                          <span className="text-ink-soft">none</span>
                        )}
                      </td>
                      <td className="pl-2 text-right">{isOriginal ? null : <PickSize designation={candidate.designation} />}</td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        </section>
      ))}
    </div>
  );
}
