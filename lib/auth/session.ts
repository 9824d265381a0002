import { getAuth } from "./auth";

/** What the app knows about the signed-in person; never a password hash or a session token. */
export interface SessionUser {
  id: string;
  name: string;
  email: string;
  role: string;
}

/** The person the request's session cookie belongs to, or null when there is none (or it has expired). */
export async function getSessionUser(headers: Headers): Promise<SessionUser | null> {
  const auth = await getAuth();
  const session = await auth.api.getSession({ headers });
  if (!session) return null;
  const { id, name, email, role } = session.user;
  return { id, name, email, role: role ?? "customer" };
}
