"use client";

import { useSyncExternalStore } from "react";
import { useCopyLink } from "./use-copy-link";

const here = () => window.location.pathname + window.location.search;
const signInHref = (path: string) => `/sign-in?next=${encodeURIComponent(path)}`;
const noSubscription = () => () => undefined;

/**
 * For whoever may not save a Fit card: the page's address already holds its sizes and picks, so its
 * link is the thing to keep or send. Signed out, a link to sign in and come back here.
 */
export function CopyOrSignIn({ signedOut }: { signedOut: boolean }) {
  const { status, copy } = useCopyLink();
  const path = useSyncExternalStore(noSubscription, here, () => "/");
  const button = "inline-flex min-h-11 items-center rounded border border-accent px-4 font-semibold text-accent";
  return (
    <div className="flex flex-col gap-2 print:hidden">
      <p className="text-ink-soft">
        This page&apos;s link holds what you see: copy it to come back later or to send it on.{" "}
        {signedOut ? "Sign in to save it as a Fit card." : "Your account cannot save Fit cards."}
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="button" onClick={() => copy(window.location.href)} className={button}>
          Copy link
        </button>
        {signedOut ? (
          <a
            href={signInHref(path)}
            // The pages write their state into the address without a render here; read it again as the link is followed.
            onClick={(event) => {
              event.currentTarget.href = signInHref(here());
            }}
            className={button}
          >
            Sign in to save a Fit card
          </a>
        ) : null}
      </div>
      <p role="status" aria-live="polite" className="text-sm text-ink-soft break-all">
        {status}
      </p>
    </div>
  );
}
