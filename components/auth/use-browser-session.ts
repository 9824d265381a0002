"use client";

import { useEffect, useState } from "react";

/** Who is signed in, as the browser reads it: "loading", "signed-out", or their name and role. */
export type BrowserSession = "loading" | "signed-out" | { name: string; role: string };

/**
 * Reads the session from the sign-in service after the page has loaded, so that a page showing
 * something per person (the account menu, staff-only controls) stays the same for everyone on the
 * server. Only for what is shown: every action checks the role again on the server.
 */
export function useBrowserSession(): [BrowserSession, (session: BrowserSession) => void] {
  const [session, setSession] = useState<BrowserSession>("loading");
  useEffect(() => {
    let live = true;
    fetch("/api/auth/get-session")
      .then((response) => (response.ok ? response.json() : null))
      .then((answer: { user?: { name?: unknown; role?: unknown } } | null) => {
        if (!live) return;
        const { name, role } = answer?.user ?? {};
        setSession(typeof name === "string" ? { name, role: typeof role === "string" ? role : "customer" } : "signed-out");
      })
      .catch(() => live && setSession("signed-out"));
    return () => {
      live = false;
    };
  }, []);
  return [session, setSession];
}
