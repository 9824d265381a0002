import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { hasRole, type Role } from "./roles";
import { getSessionUser, type SessionUser } from "./session";

export interface PageAccess {
  allowed: boolean;
  user: SessionUser;
}

/**
 * For a server page: the signed-in user, checked on every request. Nobody signed in → sent to sign in
 * and brought back; signed in without the role → `allowed: false`, for the page to explain.
 */
export async function requirePageUser(path: string, role: Role): Promise<PageAccess> {
  const user = await getSessionUser(await headers());
  if (!user) redirect(`/sign-in?next=${encodeURIComponent(path)}`);
  return { allowed: hasRole(user.role, role), user };
}
