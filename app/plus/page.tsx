import type { Metadata } from "next";
import { connection } from "next/server";
import { getDb } from "@/lib/database/app-database";
import { PlusForm } from "@/components/plus/plus-form";
import { PlusGroups } from "@/components/plus/plus-groups";
import { PlusActions, PlusPicks } from "@/components/plus/plus-picks";
import { PlusWidthRule } from "@/components/plus/plus-width-rule";
import { PageIntro } from "@/components/ui/page-intro";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import { sizeChangeCautions } from "@/content/safety";
import { readShopTolerance } from "@/lib/shop/tolerance";
import { answerPlus, plusQuerySchema } from "@/lib/plus/plus-request";

export const metadata: Metadata = {
  title: "Plus planner",
  description: "Sizes on a smaller or larger wheel that keep the overall diameter within tolerance, and which of them the shop stocks.",
};

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// Rendered per request: the size and wheel come in the address, and the counts come from the stock, which changes with every sale.
export default async function PlusPlannerPage({ searchParams }: { searchParams: SearchParams }) {
  await connection();
  const params = Object.fromEntries(Object.entries(await searchParams).map(([key, value]) => [key, Array.isArray(value) ? value[0] : value]));
  const query = plusQuerySchema.safeParse(params);
  const db = await getDb();
  const defaultTolerancePct = await readShopTolerance(db);
  const answer = query.success ? await answerPlus(db, query.data) : null;
  const values = query.success ? query.data : { size: typeof params.size === "string" ? params.size : undefined };
  return (
    <section className="flex flex-col gap-6">
      <PageIntro eyebrow="Plus planner" title="Bigger (or smaller) wheels, same overall size">
        <p>Every size on a wheel one inch smaller to three inches larger whose overall diameter stays within tolerance of the current one.</p>
      </PageIntro>
      <PlusForm values={values} defaultTolerancePct={defaultTolerancePct} />
      {answer && !answer.ok ? (
        <p role="alert" className="rounded border-l-4 border-danger bg-sheet p-4">
          {answer.message}
        </p>
      ) : null}
      {!query.success && params.size ? (
        <p role="alert" className="rounded border-l-4 border-danger bg-sheet p-4">
          {query.error.issues[0]?.message ?? "Check the values above."}
        </p>
      ) : null}
      {answer?.ok ? (
        <>
          <p className="text-ink-soft">
            {answer.plan.candidates.length} sizes within ±{answer.plan.tolerancePct} % of {answer.plan.original.designation} (
            {Math.round(answer.plan.original.overallDiameterMm)} mm). A lower sidewall rides firmer and protects the wheel less. Not every size is
            made: &ldquo;In the catalog&rdquo; says which the shop can supply, and those come first in each group. The rim width is the theoretical one: section width × a factor set by
            the aspect ratio (UN Regulation No. 30, §6.1.1.1), rounded to the half inch.
          </p>
          <PlusWidthRule params={params} every={query.success && query.data.all === true} />
          <PlusPicks>
            <PlusGroups plan={answer.plan} speedSymbol={query.success ? query.data.speedSymbol : undefined} />
            <PlusActions
              original={answer.plan.original.designation}
              loadIndex={query.success ? query.data.loadIndex : undefined}
              speedSymbol={query.success ? query.data.speedSymbol : undefined}
              tolerancePct={answer.plan.tolerancePct}
            />
          </PlusPicks>
        </>
      ) : null}
      <SafetyCautions cautions={sizeChangeCautions} />
    </section>
  );
}
