import { connection, type NextRequest } from "next/server";
import type { z } from "zod";
import { type Database } from "@/db/client";
import { getDb } from "@/lib/database/app-database";
import { parseJsonBody } from "@/lib/api/body";
import { apiError } from "@/lib/api/errors";
import { parseQuery } from "@/lib/api/query";
import { clientAddress } from "@/lib/security/client-address";
import { checkRequestOrigin, isStateChanging } from "@/lib/security/request-origin";
import { appOrigin } from "./auth-env";
import { hasRole, type Role } from "./roles";
import { getSessionUser, type SessionUser } from "./session";

type Schema = z.ZodType;
type Parsed<S> = S extends Schema ? z.infer<S> : undefined;
type Access = Role | "public";

export interface RouteOptions<A extends Access, Q extends Schema | undefined, B extends Schema | undefined, P extends Schema | undefined> {
  /** "public", or the least role allowed: admin includes staff, staff includes customer. */
  role: A;
  query?: Q;
  body?: B;
  params?: P;
  /**
   * A limit per client address, counted before anything is validated so that every request from
   * the address counts, valid or not; a Response (429) refuses the request.
   */
  limitByAddress?: (db: Database, address: string) => Promise<Response | null>;
}

export interface RouteInput<A, Q, B, P> {
  request: NextRequest;
  /** Null on public routes, which never look the session up. */
  user: A extends "public" ? null : SessionUser;
  db: Database;
  query: Parsed<Q>;
  body: Parsed<B>;
  params: Parsed<P>;
}

interface RouteContext {
  params: Promise<Record<string, string | string[] | undefined>>;
}

/**
 * The one wrapper around every route handler that reads the database or changes anything:
 * a state-changing request from another origin → 403 forbidden; anonymous → 401 unauthenticated,
 * signed in without the role → 403 forbidden; then the address limit, then the path, query and body
 * validated with zod (400/413/415 in the API's error shape) before the handler runs.
 */
export function withRoute<
  A extends Access,
  Q extends Schema | undefined = undefined,
  B extends Schema | undefined = undefined,
  P extends Schema | undefined = undefined,
>(options: RouteOptions<A, Q, B, P>, handler: (input: RouteInput<A, Q, B, P>) => Promise<Response>) {
  return async (request: NextRequest, context?: RouteContext): Promise<Response> => {
    if (isStateChanging(request.method)) {
      const origin = checkRequestOrigin(request.headers, appOrigin());
      if (!origin.ok) return apiError("forbidden", origin.message);
    }
    await connection();
    let user: SessionUser | null = null;
    if (options.role !== "public") {
      user = await getSessionUser(request.headers);
      if (!user) return apiError("unauthenticated", "Sign in to use this endpoint.");
      if (!hasRole(user.role, options.role)) return apiError("forbidden", `This endpoint is for ${options.role} accounts.`);
    }
    const db = await getDb();
    if (options.limitByAddress) {
      const refused = await options.limitByAddress(db, clientAddress(request.headers));
      if (refused) return refused;
    }

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
    return handler({ request, user, db, query, body, params } as RouteInput<A, Q, B, P>);
  };
}
