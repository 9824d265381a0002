import { z } from "zod";
import { CONTROL_CHARACTER_MESSAGE, hasControlCharacters } from "@/lib/validation/text-rules";
import { apiError } from "./errors";

/** Longest text parameter the API reads; anything longer answers 414. */
export const maxTextParameterLength = 2000;

type QueryResult<T> = { ok: true; value: T } | { ok: false; response: Response };

/**
 * Validates a query string with zod and turns the first problem into the API's error shape:
 * a missing parameter → 400 missing_parameter, an over-long text → 414 too_long, a control character
 * (NUL, a line break…) or anything else wrong → 400 invalid_parameter. The parameter is named in `field`.
 */
export function parseQuery<Schema extends z.ZodType>(url: URL, schema: Schema): QueryResult<z.infer<Schema>> {
  const raw: Record<string, string> = {};
  for (const [key, value] of url.searchParams) raw[key] ??= value;

  const tooLong = Object.entries(raw).find(([, value]) => value.length > maxTextParameterLength);
  if (tooLong) {
    return {
      ok: false,
      response: apiError("too_long", `The parameter "${tooLong[0]}" is longer than ${maxTextParameterLength} characters.`, undefined, tooLong[0]),
    };
  }
  const control = Object.entries(raw).find(([key, value]) => hasControlCharacters(key) || hasControlCharacters(value, { multiLine: true }));
  if (control) {
    return {
      ok: false,
      response: apiError("invalid_parameter", `The parameter "${control[0]}" is invalid: ${CONTROL_CHARACTER_MESSAGE}.`, undefined, control[0]),
    };
  }

  const parsed = schema.safeParse(raw);
  if (parsed.success) return { ok: true, value: parsed.data };

  const issue = parsed.error.issues[0];
  const name = String(issue?.path[0] ?? "query");
  const missing = raw[name] === undefined || (raw[name]?.trim() === "" && issue?.code === "too_small");
  return {
    ok: false,
    response: missing
      ? apiError("missing_parameter", `The parameter "${name}" is required.`, undefined, name)
      : apiError("invalid_parameter", `The parameter "${name}" is invalid: ${issue?.message ?? "unexpected value"}.`, undefined, name),
  };
}
