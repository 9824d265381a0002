import type { Metadata } from "next";
import { TopicCards } from "@/components/learn/topic-cards";
import { UnitsNote } from "@/components/learn/units-note";
import { PageIntro } from "@/components/ui/page-intro";
import { lessons } from "@/content/learn";

export const metadata: Metadata = {
  title: "Sidewall school",
  description: "Plain-words lessons on every sidewall marking: load index, speed symbols, load range, the DOT code, UTQG, winter marks, run-flat and XL, and overall diameter.",
};

export default async function SidewallSchoolPage() {
  return (
    <section>
      <PageIntro eyebrow="Plain-words reference" title="Sidewall school">
        <p>What each marking on a tire means, one topic at a time. Every lesson names the standard it follows and says plainly what is only common practice.</p>
      </PageIntro>
      <TopicCards lessons={lessons} />
      <p className="mt-8 max-w-3xl text-sm text-ink-soft">
        <span className="font-semibold text-ink">Units: </span>
        <UnitsNote />
      </p>
    </section>
  );
}
