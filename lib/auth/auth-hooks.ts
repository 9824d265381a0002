import { APIError, createAuthMiddleware, isAPIError } from "better-auth/api";
import { z } from "zod";
import type { Database } from "@/db/client";
import { PASSWORD_LENGTH } from "./form-checks";
import { clearSignInFailures, recordSignInFailure, signInWaitSeconds } from "./sign-in-throttle";

const emailBody = z.object({ email: z.string() });
const adminPasswordBody = z.object({ password: z.string().min(PASSWORD_LENGTH.min).max(PASSWORD_LENGTH.max) });
const userIdBody = z.object({ userId: z.coerce.string() });

/**
 * Runs before each of the sign-in service's endpoints: a sign-in waits its turn after repeated
 * failures for the account (429 with Retry-After), and an account an admin creates gets a password
 * under the same rules as sign-up.
 */
export function beforeAuthHook(db: Database) {
  return createAuthMiddleware(async (ctx) => {
    if (ctx.path === "/sign-in/email") {
      const body = emailBody.safeParse(ctx.body);
      if (!body.success) return;
      const wait = await signInWaitSeconds(db, body.data.email);
      if (wait > 0) {
        throw new APIError(
          "TOO_MANY_REQUESTS",
          { code: "TOO_MANY_FAILED_SIGN_INS", message: `Too many failed sign-ins for this account. Try again in ${wait} seconds, or reset the password.` },
          { "Retry-After": String(wait) },
        );
      }
    }
    if (ctx.path === "/admin/create-user" && !adminPasswordBody.safeParse(ctx.body).success) {
      throw new APIError("BAD_REQUEST", {
        code: "INVALID_PASSWORD",
        message: `Give the account a password of ${PASSWORD_LENGTH.min} to ${PASSWORD_LENGTH.max} characters, as at sign-up.`,
      });
    }
  });
}

/**
 * Runs after each endpoint: a wrong password counts against the account, a right one clears its
 * count; a password an admin sets ends the account's sessions, as a reset by e-mail does.
 */
export function afterAuthHook(db: Database) {
  return createAuthMiddleware(async (ctx) => {
    const returned = ctx.context.returned;
    const failed = isAPIError(returned);
    if (ctx.path === "/sign-in/email") {
      const body = emailBody.safeParse(ctx.body);
      if (!body.success) return;
      if (!failed) await clearSignInFailures(db, body.data.email);
      else if (returned.statusCode === 401) await recordSignInFailure(db, body.data.email);
    }
    if (ctx.path === "/admin/set-user-password" && !failed) {
      const body = userIdBody.safeParse(ctx.body);
      if (body.success) await ctx.context.internalAdapter.deleteUserSessions(body.data.userId);
    }
  });
}
