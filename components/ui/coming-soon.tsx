import Link from "next/link";
import { PageIntro } from "./page-intro";

/** A screen that is planned but not open yet: says so plainly and offers the way back. */
export function ComingSoon({ title, summary }: { title: string; summary: string }) {
  return (
    <section>
      <PageIntro eyebrow="Coming soon" title={title}>
        <p>{summary}</p>
      </PageIntro>
      <p>
        <Link href="/" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
          Go to the Sidewall reader
        </Link>
      </p>
    </section>
  );
}
