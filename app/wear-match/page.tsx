import type { Metadata } from "next";
import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import { WearMatchForm } from "@/components/wear-match/wear-match-form";
import { WearMatchResult } from "@/components/wear-match/wear-match-result";
import { wearMatchCautions } from "@/content/safety";
import { readCachedShopWearLimit32 } from "@/lib/shop/shop-cache";
import { readWearMatchPage } from "@/lib/wear-match/page-state";

export const metadata: Metadata = {
  title: "Wear match",
  description: "Replacing one or two tires on an all-wheel-drive vehicle: whether a new tire goes on as it is, is shaved to match, or the set is replaced.",
};

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

const EXAMPLE = "/wear-match?size=225-65R17&newTreadDepth32=10&remaining32=6,6,7";

// Rendered per request: the answer is read from the address.
export default async function WearMatchPage({ searchParams }: { searchParams: SearchParams }) {
  const shopLimit32 = await readCachedShopWearLimit32();
  const state = readWearMatchPage(await searchParams, shopLimit32);
  return (
    <section className="flex flex-col gap-6">
      <PageIntro eyebrow="Wear match" title="One or two new tires on an all-wheel-drive vehicle">
        <p>
          Measure what is left on the tires that stay, and see whether a new tire can go on as it is, must be shaved to match, or the set must be replaced.
          One size on all four only.
        </p>
      </PageIntro>
      <WearMatchForm state={state} shopLimit32={shopLimit32} />
      {state.answer ? (
        <WearMatchResult answer={state.answer} />
      ) : (
        <p>
          For example, <Link href={EXAMPLE} className="text-accent underline">a new 10/32 in tire beside three at 6, 6 and 7/32 in</Link>.
        </p>
      )}
      <p>
        How to measure, and why all-wheel drive cares:{" "}
        <Link href="/learn/tread-depth" className="text-accent underline">
          Tread depth and all-wheel drive
        </Link>
        .
      </p>
      <SafetyCautions cautions={wearMatchCautions} />
    </section>
  );
}
