"use client";

import { useBrowserSession } from "@/components/auth/use-browser-session";
import { hasRole } from "@/lib/tire/vocabulary";

/**
 * Whether staff are looking, read in the browser so the finder is the same page for everyone on the
 * server; false until the session is known. Only for what is shown: actions check the role again.
 */
export function useStaffView(): boolean {
  const [session] = useBrowserSession();
  return typeof session === "object" && hasRole(session.role, "staff");
}
