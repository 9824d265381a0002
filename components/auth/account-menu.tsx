"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { postAuth } from "./post-auth";
import type { BrowserSession } from "./use-browser-session";

const linkClass = "inline-flex min-h-11 items-center px-2 font-semibold text-accent underline-offset-4 hover:underline";

interface AccountMenuProps {
  /** Read in the browser (`useBrowserSession`) so pages stay static; shared with the navigation. */
  state: BrowserSession;
  onChange: (session: BrowserSession) => void;
}

/** Sign in, or the signed-in person's account link and a sign-out button. */
export function AccountMenu({ state, onChange }: AccountMenuProps) {
  const router = useRouter();

  async function signOut() {
    await postAuth("sign-out", {});
    onChange("signed-out");
    router.push("/");
    router.refresh();
  }

  if (state === "loading") return <div className="min-h-11" aria-hidden="true" />;
  if (state === "signed-out") {
    return (
      <Link href="/sign-in" prefetch={false} className={linkClass}>
        Sign in
      </Link>
    );
  }
  return (
    <div className="flex items-center gap-1">
      <Link href="/account" prefetch={false} className={linkClass}>
        <span className="sr-only">Account of </span>
        {state.name}
      </Link>
      <button type="button" onClick={signOut} className="min-h-11 rounded border border-rule px-3 font-semibold">
        Sign out
      </button>
    </div>
  );
}
