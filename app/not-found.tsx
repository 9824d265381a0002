import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";

export default function NotFound() {
  return (
    <section>
      <PageIntro eyebrow="404 · not found" title="We could not find that page">
        <p>The address may be mistyped, or the page has moved. Try reading your sidewall from the start.</p>
      </PageIntro>
      <Link href="/" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        Back to the Sidewall reader
      </Link>
    </section>
  );
}
