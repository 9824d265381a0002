"use client";

import { useEffect, useSyncExternalStore } from "react";

/** Who is signed in, as the browser reads it: "loading", "signed-out", or their name and role. */
export type BrowserSession = "loading" | "signed-out" | { name: string; role: string };

// One reading shared by everything on the page that shows the session (navigation, account menu,
// Fit card and finder controls): a single get-session request, and a sign-out seen by all at once.
let session: BrowserSession = "loading";
let requested = false;
/** Bumped when the last reader goes, so that an answer to an older request is dropped. */
let generation = 0;
const listeners = new Set<() => void>();

function publish(next: BrowserSession): void {
  session = next;
  for (const listener of listeners) listener();
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => {
    listeners.delete(listener);
    if (listeners.size > 0) return;
    // Nothing shows the session any more: the next reader asks again.
    session = "loading";
    requested = false;
    generation += 1;
  };
}

function requestSession(): void {
  if (requested) return;
  requested = true;
  const asked = generation;
  fetch("/api/auth/get-session")
    .then((response) => (response.ok ? response.json() : null))
    .then((answer: { user?: { name?: unknown; role?: unknown } } | null) => {
      const { name, role } = answer?.user ?? {};
      if (asked === generation) publish(typeof name === "string" ? { name, role: typeof role === "string" ? role : "customer" } : "signed-out");
    })
    .catch(() => asked === generation && publish("signed-out"));
}

/**
 * Reads the session from the sign-in service after the page has loaded, so that a page showing
 * something per person (the account menu, staff-only controls) stays the same for everyone on the
 * server. Only for what is shown: every action checks the role again on the server.
 */
export function useBrowserSession(): [BrowserSession, (session: BrowserSession) => void] {
  const current = useSyncExternalStore(subscribe, () => session, () => "loading" as const);
  useEffect(requestSession, []);
  return [current, publish];
}
