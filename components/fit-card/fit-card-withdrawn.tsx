import Link from "next/link";
import { PageIntro } from "@/components/ui/page-intro";

/** What a revoked or expired card's link shows: why, and where to go instead. */
export function FitCardWithdrawn({ why }: { why: "revoked" | "expired" }) {
  return (
    <section>
      <PageIntro eyebrow="Fit card" title={why === "revoked" ? "This Fit card was withdrawn" : "This Fit card has expired"}>
        <p>
          Prices and stock change, so the shop no longer shows this card. Ask the shop for a new one, or look up your size again.
        </p>
      </PageIntro>
      <Link href="/replace" className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
        Find tires for your size
      </Link>
    </section>
  );
}
