import type { z } from "zod";

/** A cursor as the API hands it out: JSON, base64url, opaque to clients. */
export function encodeCursor(value: unknown): string {
  return Buffer.from(JSON.stringify(value), "utf8").toString("base64url");
}

/** The cursor's value, or null for anything this server did not hand out in that shape. */
export function decodeCursor<T>(text: string, schema: z.ZodType<T>): T | null {
  try {
    const parsed = schema.safeParse(JSON.parse(Buffer.from(text, "base64url").toString("utf8")));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}
