import type { Metadata } from "next";
import { connection } from "next/server";
import { getDb } from "@/lib/database/app-database";
import { ReplacementFinder } from "@/components/finder/replacement-finder";
import { StartForm } from "@/components/finder/start-form";
import { PageIntro } from "@/components/ui/page-intro";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import { readFinderQuery } from "@/lib/finder/finder-query";
import { readOriginalMarking } from "@/lib/finder/original-marking";
import { readCachedShopTolerance, readCachedShopWearLimit32 } from "@/lib/shop/shop-cache";
import { listBrandNames } from "@/lib/finder/queries";

export const metadata: Metadata = {
  title: "Replacement finder",
  description: "Equal-or-better tires from the shop's stock: same rim, load index and speed rating at least as high, diameter within tolerance.",
};

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// Rendered per request: the search lives in the address, and the brands listed come from the stock,
// which changes with every sale. The shop's default tolerance comes from the cache.
export default async function ReplacementFinderPage({ searchParams }: { searchParams: SearchParams }) {
  await connection();
  const query = readFinderQuery(await searchParams);
  const complete = Boolean(query.size && query.loadIndex !== undefined && query.speedSymbol);
  const db = await getDb();
  const [brands, defaultTolerancePct, shopWearLimit32] = await Promise.all([listBrandNames(db), readCachedShopTolerance(), readCachedShopWearLimit32()]);
  return (
    <section className="flex flex-col gap-6">
      <PageIntro eyebrow="Replacement finder" title="Equal-or-better tires in stock">
        <p>Same rim diameter, a load index and speed rating at least as high, and an overall diameter close enough to keep the speedometer honest.</p>
      </PageIntro>
      <StartForm query={query} open={!complete} />
      {complete ? (
        <ReplacementFinder
          key={`${query.size}|${query.loadIndex}|${query.loadIndexDual}|${query.speedSymbol}|${query.loadRange}`}
          initialQuery={query}
          original={readOriginalMarking(query)}
          brands={brands}
          defaultTolerancePct={defaultTolerancePct}
          shopWearLimit32={shopWearLimit32}
        />
      ) : null}
      <SafetyCautions />
    </section>
  );
}
