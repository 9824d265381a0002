import type { Metadata } from "next";
import { SideBySide } from "@/components/compare/side-by-side";
import { readSizeEntry } from "@/components/compare/size-entry";
import { PageIntro } from "@/components/ui/page-intro";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import { sizeChangeCautions } from "@/content/safety";
import { MAX_COMPARED_SIZES } from "@/lib/compare/compare-limits";
import { formatSize, sizeFromSlug } from "@/lib/tire";

export const metadata: Metadata = {
  title: "Side-by-side",
  description: "Draw up to four tire sizes over each other to scale and see what changes: diameter, sidewall, clearance and the speedometer.",
};

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// Rendered per request: the sizes to compare come in the address.
export default async function SideBySidePage({ searchParams }: { searchParams: SearchParams }) {
  const { sizes } = await searchParams;
  const typed = typeof sizes === "string" ? sizes.slice(0, 400).split(",").map((size) => size.trim()).filter(Boolean) : [];
  // Slugs from the address are shown as people write sizes: 285-50R20 becomes 285/50R20.
  const initialSizes = typed.slice(0, MAX_COMPARED_SIZES).map((text) => {
    const size = sizeFromSlug(text);
    return size ? formatSize(size) : text;
  });
  return (
    <section className="flex flex-col gap-6">
      <PageIntro eyebrow="Side-by-side" title="What a different size changes">
        <p>Up to four sizes drawn over each other to one scale. The first is the reference: the size your speedometer is set for.</p>
      </PageIntro>
      <SideBySide initialEntries={(initialSizes.length > 0 ? initialSizes : ["", ""]).map(readSizeEntry)} />
      <SafetyCautions cautions={sizeChangeCautions} />
    </section>
  );
}
