import { z } from "zod";
import { CONTROL_CHARACTER_MESSAGE, findControlCharacters } from "@/lib/validation/text-rules";
import { apiError } from "./errors";

/** Largest JSON body a route reads. */
export const maxJsonBodyBytes = 64 * 1024;

type BodyResult<T> = { ok: true; value: T } | { ok: false; response: Response };
export type BytesResult = { ok: true; bytes: Uint8Array<ArrayBuffer> } | { ok: false; tooLarge: true };

/** Whether the request carries a body (RFC 9112 §6.3: a length over 0, a transfer coding, or a stream of its own). */
export function hasBody(request: Request): boolean {
  const length = request.headers.get("content-length");
  if (length !== null) return length.trim() !== "0";
  return request.headers.has("transfer-encoding") || request.body !== null;
}

/** `application/json`, with or without parameters such as `charset` (RFC 9110 §8.3.1). */
export function isJsonMediaType(contentType: string | null): boolean {
  return contentType?.split(";")[0]?.trim().toLowerCase() === "application/json";
}

/**
 * The body's bytes, never more than `maxBytes`: a declared Content-Length over the limit is refused
 * before anything is read, and a body without one (or with a false one) is read only until it
 * passes the limit, so that a huge upload never sits in memory.
 */
export async function readBodyBytes(request: Request, maxBytes: number): Promise<BytesResult> {
  const declared = request.headers.get("content-length");
  if (declared !== null && Number(declared) > maxBytes) return { ok: false, tooLarge: true };
  if (!request.body) return { ok: true, bytes: new Uint8Array(0) };
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      return { ok: false, tooLarge: true };
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return { ok: true, bytes };
}

export const tooLargeBody = () => apiError("too_large", `The body is larger than ${maxJsonBodyBytes / 1024} KB.`);
export const wrongMediaType = () => apiError("unsupported_media_type", "Send the body as JSON, with the header Content-Type: application/json.");

/** UTF-8 JSON with no control character in any text (a tab or a line break is fine), or the 400 to answer. */
export function readJson(bytes: Uint8Array): BodyResult<unknown> {
  let raw: unknown;
  try {
    raw = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    return { ok: false, response: apiError("invalid_parameter", "The body is not valid JSON.") };
  }
  const controlAt = findControlCharacters(raw);
  if (!controlAt) return { ok: true, value: raw };
  const field = controlAt.join(".") || "body";
  return { ok: false, response: apiError("invalid_parameter", `The field "${field}" is invalid: ${CONTROL_CHARACTER_MESSAGE}.`, undefined, field) };
}

/**
 * Reads a JSON body and validates it with zod, answering in the API's error shape: another content
 * type → 415 unsupported_media_type; too big → 413 too_large; not JSON, or a control character in
 * any text → 400 invalid_parameter; a field that is absent → 400 missing_parameter; anything else
 * wrong → 400 invalid_parameter. Errors about one field name it in `field`.
 */
export async function parseJsonBody<Schema extends z.ZodType>(request: Request, schema: Schema): Promise<BodyResult<z.infer<Schema>>> {
  if (hasBody(request) && !isJsonMediaType(request.headers.get("content-type"))) return { ok: false, response: wrongMediaType() };
  const read = await readBodyBytes(request, maxJsonBodyBytes);
  if (!read.ok) return { ok: false, response: tooLargeBody() };
  const json = readJson(read.bytes);
  if (!json.ok) return json;
  const raw = json.value;
  const parsed = schema.safeParse(raw);
  if (parsed.success) return { ok: true, value: parsed.data };

  const issue = parsed.error.issues[0];
  const name = issue?.path.join(".") || "body";
  const isObject = typeof raw === "object" && raw !== null && !Array.isArray(raw);
  const missing = isObject && issue?.path.length === 1 && (raw as Record<PropertyKey, unknown>)[issue.path[0] as PropertyKey] === undefined;
  return {
    ok: false,
    response: missing
      ? apiError("missing_parameter", `The field "${name}" is required.`, undefined, name)
      : apiError("invalid_parameter", `The field "${name}" is invalid: ${issue?.message ?? "unexpected value"}.`, undefined, name),
  };
}
