import { headers } from "next/headers";
import { z } from "zod";
import { type Database } from "@/db/client";
import { getDb } from "@/lib/database/app-database";
import { checkRequestOrigin } from "@/lib/security/request-origin";
import { appOrigin } from "./auth-env";
import { hasRole, type Role } from "./roles";
import { getSessionUser, type SessionUser } from "./session";

/** What every server action answers: the same statuses as the JSON API, and errors per field for forms. */
export type ActionResult<T = undefined> =
  | { ok: true; data: T; message?: string }
  | { ok: false; status: 400 | 401 | 403 | 404 | 409; message: string; fieldErrors?: Record<string, string> };

export interface ActionInput<T> {
  input: T;
  user: SessionUser;
  db: Database;
}

/** A plain object from a form's fields; a repeated field keeps its last value. */
function formToObject(form: FormData): Record<string, FormDataEntryValue> {
  return Object.fromEntries(form.entries());
}

/**
 * The server-action twin of withRoute: a request from another origin → 403 (proxy.ts refuses the
 * foreign origins Next.js would otherwise answer with 500 before this runs), anonymous → 401,
 * signed in without the role → 403, then the input (an object, or a form's FormData) validated
 * with zod → 400 with a message per field.
 * Use as `export const changeRole = withAction({ role: "admin", input: schema }, handler)` in a
 * "use server" module; for `useActionState`, call it as `(previous, form) => changeRole(form)`.
 */
export function withAction<Schema extends z.ZodType, T>(
  options: { role: Role; input: Schema },
  handler: (input: ActionInput<z.infer<Schema>>) => Promise<ActionResult<T>>,
) {
  return async (raw: unknown): Promise<ActionResult<T>> => {
    const requestHeaders = await headers();
    const origin = checkRequestOrigin(requestHeaders, appOrigin());
    if (!origin.ok) return { ok: false, status: 403, message: origin.message };
    const user = await getSessionUser(requestHeaders);
    if (!user) return { ok: false, status: 401, message: "Your session has ended: sign in again." };
    if (!hasRole(user.role, options.role)) return { ok: false, status: 403, message: `Only ${options.role} accounts can do this.` };
    const parsed = options.input.safeParse(raw instanceof FormData ? formToObject(raw) : raw);
    if (!parsed.success) {
      const fieldErrors: Record<string, string> = {};
      for (const issue of parsed.error.issues) fieldErrors[issue.path.join(".") || "form"] ??= issue.message;
      return { ok: false, status: 400, message: "Some fields need another look.", fieldErrors };
    }
    return handler({ input: parsed.data, user, db: await getDb() });
  };
}
