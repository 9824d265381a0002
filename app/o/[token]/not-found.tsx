import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";

export default function OfferNotFound() {
  return (
    <section>
      <PageIntro eyebrow="404 · Offer" title="No offer has this address">
        <p>
          Check that the whole link from the shop&apos;s e-mail was copied: an offer&apos;s address ends in 32 letters, digits, dashes or underscores. If it
          still does not open, call the shop: they can send the offer again.
        </p>
      </PageIntro>
      <Link href="/replace" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        Find tires for your size
      </Link>
    </section>
  );
}
