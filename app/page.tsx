import { SidewallReader } from "@/components/reader/sidewall-reader";
import { PageIntro } from "@/components/ui/page-intro";
import { parseMarking } from "@/lib/tire/parse/parse-marking";

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

// Rendered per request: the text to read comes in the address (?q=), so a shared link opens with it,
// read here so that the browser's first load carries no reader.
export default async function SidewallReaderPage({ searchParams }: { searchParams: SearchParams }) {
  const { q } = await searchParams;
  const initialText = typeof q === "string" ? q.slice(0, 2000) : "";
  return (
    <section>
      <PageIntro eyebrow="Sidewall reader" title="What does your sidewall say?">
        <p>Each part explained in plain words and the size drawn to scale, as you type.</p>
      </PageIntro>
      <SidewallReader initialText={initialText} initialResult={parseMarking(initialText, { today: new Date() })} />
    </section>
  );
}
