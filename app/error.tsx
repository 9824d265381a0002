"use client";

import { useEffect } from "react";
import { PageIntro } from "@/components/ui/page-intro";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <section>
      <PageIntro eyebrow="Something went wrong" title="This page could not be shown">
        <p>Nothing you entered was lost. Try again; if it keeps happening, call the shop.</p>
      </PageIntro>
      <button
        type="button"
        onClick={reset}
        className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90"
      >
        Try again
      </button>
      {error.digest ? <p className="mt-4 font-mono text-xs text-ink-soft">Reference: {error.digest}</p> : null}
    </section>
  );
}
