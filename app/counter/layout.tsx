import type { ReactNode } from "react";
import { headers } from "next/headers";
import { CounterNav } from "@/components/counter/counter-nav";
import { hasRole } from "@/lib/auth/roles";
import { getSessionUser } from "@/lib/auth/session";

// Rendered per request, like every Counter page: it reads the session, and shows stock and requests as they are now.
/** The Counter's section tabs, for staff and admins; each page still checks access itself. */
export default async function CounterLayout({ children }: { children: ReactNode }) {
  const user = await getSessionUser(await headers());
  const isStaff = hasRole(user?.role, "staff");
  return (
    <>
      {isStaff ? <CounterNav isAdmin={hasRole(user?.role, "admin")} /> : null}
      {children}
    </>
  );
}
