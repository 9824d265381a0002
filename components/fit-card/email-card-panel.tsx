import type { EmailSendRow } from "@/lib/email/queries";
import { EmailHistory } from "./email-history";
import { LazyEmailCardForm } from "./lazy-email-card-form";

/** The Counter's tools under a Fit card: e-mail its link, and see who has. Rendered for staff only. */
export function EmailCardPanel({ slug, sends, timeZone }: { slug: string; sends: EmailSendRow[]; timeZone: string }) {
  return (
    <section aria-labelledby="email-card-heading" className="mt-8 flex flex-col gap-4 rounded border border-rule bg-sheet p-4 print:hidden">
      <div>
        <p className="text-sm font-semibold tracking-wide text-ink-soft uppercase">For shop staff</p>
        <h2 id="email-card-heading" className="text-xl font-semibold">
          E-mail this card
        </h2>
        <p className="text-ink-soft">The customer gets the card&apos;s link, its sizes and prices, your message and the shop&apos;s contact.</p>
      </div>
      <LazyEmailCardForm slug={slug} />
      <EmailHistory sends={sends} timeZone={timeZone} />
    </section>
  );
}
