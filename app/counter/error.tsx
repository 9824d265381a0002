"use client";

import Link from "next/link";
import { useEffect } from "react";
import { PageIntro } from "@/components/ui/page-intro";

export default function CounterError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <section>
      <PageIntro eyebrow="Counter · something went wrong" title="This Counter page could not be shown">
        <p>No change was lost: every save is written whole or not at all. Try again; if it keeps happening, tell the shop&apos;s admin.</p>
      </PageIntro>
      <div className="flex flex-wrap gap-x-6 gap-y-2">
        <button type="button" onClick={reset} className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90">
          Try again
        </button>
        <Link href="/counter" prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
          Back to the catalog
        </Link>
      </div>
      {error.digest ? <p className="mt-4 font-mono text-xs text-ink-soft">Reference: {error.digest}</p> : null}
    </section>
  );
}
