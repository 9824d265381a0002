import { Suspense, type ReactNode } from "react";
import { safetySummary } from "@/content/safety";

/** The safety summary and, below it, the shop's contact line (`contact`, read by the layout). */
export function SiteFooter({ contact }: { contact: ReactNode }) {
  return (
    <footer className="mt-16 border-t border-rule bg-sheet/95 text-sm text-ink-soft print:hidden">
      <div className="mx-auto flex max-w-6xl flex-col gap-3 px-4 py-6">
        <p role="note" className="max-w-3xl">
          <span className="font-semibold text-ink">Safety: </span>
          {safetySummary}
        </p>
        <Suspense fallback={<p aria-hidden="true">&nbsp;</p>}>
          {contact}
        </Suspense>
      </div>
    </footer>
  );
}
