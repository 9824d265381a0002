import { NextResponse } from "next/server";
import { z } from "zod";

/** The public API's error codes and the HTTP status each one answers with. */
export const apiErrorStatus = {
  missing_parameter: 400,
  invalid_parameter: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  already_exists: 409,
  already_accepted: 409,
  slot_taken: 409,
  not_enough_stock: 409,
  held_for_fittings: 409,
  too_late: 409,
  not_booked: 409,
  gone: 410,
  too_large: 413,
  too_long: 414,
  unsupported_media_type: 415,
  unreadable: 422,
  unknown_load_index: 422,
  unknown_speed_symbol: 422,
  unknown_line: 422,
  line_retired: 422,
  rate_limited: 429,
} as const;

export type ApiErrorCode = keyof typeof apiErrorStatus;

export const API_ERROR_CODES = Object.keys(apiErrorStatus) as [ApiErrorCode, ...ApiErrorCode[]];

/** `{"error":{"code","message"}}`, with `"field"` when the error is about one field of the request. */
export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.enum(API_ERROR_CODES),
    message: z.string(),
    /** The parameter or body field the error is about, as a dotted path ("items.1.name"). */
    field: z.string().optional(),
    /** With a fitting time refused (slot_taken, not_enough_stock): the next free times, ISO 8601 with the shop's offset. */
    nextSlots: z.array(z.object({ start: z.string(), end: z.string() })).optional(),
  }),
});

export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

export function apiError(code: ApiErrorCode, message: string, headers?: HeadersInit, field?: string, extra?: Pick<ApiErrorBody["error"], "nextSlots">): NextResponse {
  const body: ApiErrorBody = { error: { code, message, ...(field === undefined ? {} : { field }), ...extra } };
  return NextResponse.json(body, { status: apiErrorStatus[code], headers });
}
