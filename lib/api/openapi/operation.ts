import type { z } from "zod";
import type { ApiErrorCode } from "@/lib/api/errors";
import type { Role } from "@/lib/tire";

export type Method = "get" | "post" | "patch" | "delete";

/** A body's schema and the name it goes by under the document's components/schemas. */
export interface NamedSchema {
  name: string;
  schema: z.ZodType;
}

export const named = (name: string, schema: z.ZodType): NamedSchema => ({ name, schema });

/** One answer a route gives besides the shared error shape. */
export interface ApiAnswer {
  status: number;
  description: string;
  /** An application/json body. */
  json?: NamedSchema;
  /** A text/csv body, described in words. */
  csv?: string;
  headers?: Record<string, { description: string; schema: z.ZodType }>;
}

/**
 * One method of one route as the OpenAPI document describes it. The schemas are the very ones the
 * handler validates with (withRoute's `params`, `query` and `body`), so the two cannot disagree.
 */
export interface ApiOperation {
  method: Method;
  /** With `{name}` for a path parameter, as the route's folder has `[name]`. */
  path: string;
  tag: string;
  summary: string;
  description?: string;
  /** "public", or the least role allowed (admin includes staff, staff includes customer), as in withRoute. */
  access: "public" | Role;
  params?: z.ZodType;
  query?: z.ZodType;
  headers?: z.ZodType;
  /** An application/json request body, read by parseJsonBody. */
  body?: NamedSchema;
  /** A multipart/form-data request body, read by the handler itself. */
  form?: NamedSchema;
  answers: ApiAnswer[];
  /** Error codes the handler answers with itself, beyond those its guard and validation add. */
  errors?: ApiErrorCode[];
}

const QUERY_REFUSALS: ApiErrorCode[] = ["missing_parameter", "invalid_parameter", "too_long"];
const JSON_BODY_REFUSALS: ApiErrorCode[] = ["missing_parameter", "invalid_parameter", "too_large", "unsupported_media_type"];

/**
 * Every error code an operation can answer: what withRoute (lib/auth/guard.ts), parseQuery and
 * parseJsonBody refuse for its kind of request, and proxy.ts for a path segment that does not
 * decode, then the handler's own codes.
 */
export function errorCodesOf(operation: ApiOperation): ApiErrorCode[] {
  const codes = new Set<ApiErrorCode>();
  if (operation.method !== "get") codes.add("forbidden");
  if (operation.access !== "public") for (const code of ["unauthenticated", "forbidden"] as const) codes.add(code);
  if (operation.params) for (const code of ["invalid_parameter", "not_found"] as const) codes.add(code);
  if (operation.query) for (const code of QUERY_REFUSALS) codes.add(code);
  if (operation.body) for (const code of JSON_BODY_REFUSALS) codes.add(code);
  for (const code of operation.errors ?? []) codes.add(code);
  return [...codes];
}
