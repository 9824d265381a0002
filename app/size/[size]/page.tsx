import type { Metadata } from "next";
import { notFound, permanentRedirect } from "next/navigation";
import { SizeDrawing } from "@/components/size-sheet/size-drawing";
import { SizeLinks } from "@/components/size-sheet/size-links";
import { SizeParts } from "@/components/size-sheet/size-parts";
import { AskTheShop } from "@/components/quotes/ask-the-shop";
import { MeasurementsTable } from "@/components/reader/measurements-table";
import { PageIntro } from "@/components/ui/page-intro";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import { commonSizeParams, readSizeSheet } from "@/lib/size-sheet/read-size-sheet";
import { NO_NOMINAL_DIAMETER } from "@/lib/tire";

type Params = Promise<{ size: string }>;

// Nothing here changes between requests: the common sizes are rendered at build, any other size at
// its first request, and each is then served from the server's cache (bounded: next.config.mjs).
// Only a size's one spelling is kept: a 404 or a redirect to the canonical spelling is never stored.
export const dynamicParams = true;

export function generateStaticParams(): { size: string }[] {
  return commonSizeParams();
}

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const sheet = readSizeSheet((await params).size);
  if (!sheet) return { title: "Size not found" };
  return {
    title: `${sheet.designation} tire size`,
    description: sheet.summary,
    alternates: { canonical: `/size/${sheet.slug}` },
    openGraph: { title: `${sheet.designation} tire size · Sidewise`, description: sheet.summary, type: "article" },
  };
}

export default async function SizeSheetPage({ params }: { params: Params }) {
  const { size: segment } = await params;
  const sheet = readSizeSheet(segment);
  if (!sheet) notFound();
  if (segment !== sheet.slug) permanentRedirect(`/size/${sheet.slug}`);
  const { size, geometry, marking, designation, slug, summary } = sheet;

  return (
    <article className="flex flex-col gap-8">
      <PageIntro eyebrow="Size sheet" title={designation}>
        <p>{summary}</p>
      </PageIntro>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1.1fr)_minmax(0,1fr)] lg:gap-10">
        {geometry ? (
          <figure className="min-w-0 rounded border border-rule bg-sheet p-3 sm:p-4">
            <SizeDrawing size={size} geometry={geometry} />
            <figcaption className="mt-3">
              <MeasurementsTable geometry={geometry} unitSystems={["metric", "imperial"]} caption="Drawn to scale · nominal, new and unloaded" />
              <p className="mt-2 text-xs text-ink-soft">{geometry.rolling.label}.</p>
            </figcaption>
          </figure>
        ) : (
          <p className="self-start rounded border-l-4 border-accent bg-sheet p-4">
            No drawing or measurements for {designation}: {NO_NOMINAL_DIAMETER}. Sizes like it are not matched from stock here; ask the shop.
          </p>
        )}
        <div className="flex min-w-0 flex-col gap-6">
          <SizeLinks slug={slug} designation={designation} measurable={geometry !== null} />
          <AskTheShop source="size-sheet" reference={designation} tires={designation} />
          <SafetyCautions />
        </div>
      </div>
      <section aria-labelledby="parts-heading">
        <h2 id="parts-heading" className="mb-3 text-xl font-semibold">
          What {designation} means
        </h2>
        <SizeParts marking={marking} />
      </section>
    </article>
  );
}
