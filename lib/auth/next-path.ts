import { z } from "zod";

/** Where to go after signing in: a path inside the app only, never another site. */
export const nextPathSchema = z
  .string()
  .regex(/^\/(?![/\\])[^\s]*$/)
  .max(500)
  .catch("/account");

export function safeNextPath(value: unknown): string {
  return nextPathSchema.parse(typeof value === "string" ? value : "/account");
}
