import { PageIntro } from "@/components/ui/page-intro";

export default function SidewallReaderPage() {
  return (
    <section>
      <PageIntro eyebrow="Sidewall reader" title="What does your sidewall say?">
        <p>Type or paste the markings from your tire, such as 285/50R20 119S, and see each part explained and drawn to scale.</p>
      </PageIntro>
    </section>
  );
}
