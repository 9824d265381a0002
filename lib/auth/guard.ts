import { connection, type NextRequest } from "next/server";
import type { z } from "zod";
import { getDb, type Database } from "@/db/client";
import { parseJsonBody } from "@/lib/api/body";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { hasRole, type Role } from "./roles";
import { getSessionUser, type SessionUser } from "./session";

type Schema = z.ZodType;
type Parsed<S> = S extends Schema ? z.infer<S> : undefined;

export interface RouteOptions<Q extends Schema | undefined, B extends Schema | undefined, P extends Schema | undefined> {
  /** The least role allowed; admin includes staff, staff includes customer. */
  role: Role;
  query?: Q;
  body?: B;
  params?: P;
}

export interface RouteInput<Q, B, P> {
  request: NextRequest;
  user: SessionUser;
  db: Database;
  query: Parsed<Q>;
  body: Parsed<B>;
  params: Parsed<P>;
}

interface RouteContext {
  params: Promise<Record<string, string | string[] | undefined>>;
}

/**
 * The one wrapper around every protected route handler: anonymous → 401 unauthenticated, signed in
 * without the role → 403 forbidden, then the path, query and body validated with zod (400 in the
 * API's error shape) before the handler runs with the signed-in user and the database.
 */
export function withRoute<Q extends Schema | undefined = undefined, B extends Schema | undefined = undefined, P extends Schema | undefined = undefined>(
  options: RouteOptions<Q, B, P>,
  handler: (input: RouteInput<Q, B, P>) => Promise<Response>,
) {
  return async (request: NextRequest, context?: RouteContext): Promise<Response> => {
    await connection();
    const user = await getSessionUser(request.headers);
    if (!user) return apiError("unauthenticated", "Sign in to use this endpoint.");
    if (!hasRole(user.role, options.role)) return apiError("forbidden", `This endpoint is for ${options.role} accounts.`);

    let params: unknown = undefined;
    if (options.params) {
      const parsed = options.params.safeParse((await context?.params) ?? {});
      if (!parsed.success) return apiError("not_found", "Nothing is stored at this address.");
      params = parsed.data;
    }
    let query: unknown = undefined;
    if (options.query) {
      const parsed = parseQuery(request.nextUrl, options.query);
      if (!parsed.ok) return parsed.response;
      query = parsed.value;
    }
    let body: unknown = undefined;
    if (options.body) {
      const parsed = await parseJsonBody(request, options.body);
      if (!parsed.ok) return parsed.response;
      body = parsed.value;
    }
    const db = await getDb();
    return handler({ request, user, db, query, body, params } as RouteInput<Q, B, P>);
  };
}
