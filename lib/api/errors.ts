import { NextResponse } from "next/server";

/** The public API's error codes and the HTTP status each one answers with. */
export const apiErrorStatus = {
  missing_parameter: 400,
  invalid_parameter: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  already_exists: 409,
  gone: 410,
  too_large: 413,
  too_long: 414,
  unsupported_media_type: 415,
  unreadable: 422,
  unknown_load_index: 422,
  unknown_speed_symbol: 422,
  unknown_line: 422,
  rate_limited: 429,
} as const;

export type ApiErrorCode = keyof typeof apiErrorStatus;

/** `{"error":{"code","message"}}`, with `"field"` when the error is about one field of the request. */
export function apiError(code: ApiErrorCode, message: string, headers?: HeadersInit, field?: string): NextResponse {
  return NextResponse.json({ error: field === undefined ? { code, message } : { code, message, field } }, { status: apiErrorStatus[code], headers });
}
