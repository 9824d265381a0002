import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";

export default function FitCardNotFound() {
  return (
    <section>
      <PageIntro eyebrow="404 · Fit card" title="No Fit card has this address">
        <p>Check that the whole link was copied: a Fit card address ends in 24 letters, digits, dashes or underscores.</p>
      </PageIntro>
      <Link href="/" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        Go to the sidewall reader
      </Link>
    </section>
  );
}
