import { z } from "zod";
import { apiError } from "./errors";

/** Largest JSON body a route reads. */
export const maxJsonBodyBytes = 64 * 1024;

type BodyResult<T> = { ok: true; value: T } | { ok: false; response: Response };

/**
 * Reads a JSON body and validates it with zod, answering in the API's error shape: a field that is
 * absent → 400 missing_parameter, anything else wrong → 400 invalid_parameter, too big → 413 too_large.
 */
export async function parseJsonBody<Schema extends z.ZodType>(request: Request, schema: Schema): Promise<BodyResult<z.infer<Schema>>> {
  const text = await request.text();
  if (new TextEncoder().encode(text).length > maxJsonBodyBytes) {
    return { ok: false, response: apiError("too_large", `The body is larger than ${maxJsonBodyBytes} bytes.`) };
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return { ok: false, response: apiError("invalid_parameter", "The body is not valid JSON.") };
  }
  const parsed = schema.safeParse(raw);
  if (parsed.success) return { ok: true, value: parsed.data };

  const issue = parsed.error.issues[0];
  const name = issue?.path.join(".") || "body";
  const isObject = typeof raw === "object" && raw !== null && !Array.isArray(raw);
  const missing = isObject && issue?.path.length === 1 && (raw as Record<PropertyKey, unknown>)[issue.path[0] as PropertyKey] === undefined;
  return {
    ok: false,
    response: missing
      ? apiError("missing_parameter", `The field "${name}" is required.`)
      : apiError("invalid_parameter", `The field "${name}" is invalid: ${issue?.message ?? "unexpected value"}.`),
  };
}
