import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin } from "better-auth/plugins";
import type { Database } from "@/db/client";
import * as schema from "@/db/schema";
import { accountExistsEmail, passwordResetEmail, RESET_LINK_LIFETIME_SECONDS } from "@/lib/email/account-emails";
import { sendMessage } from "@/lib/email/send-email";
import { siteUrl } from "@/lib/env/site-url";
import { CLIENT_ADDRESS_HEADER } from "@/lib/security/client-address";
import { readAuthEnv } from "./auth-env";
import { afterAuthHook, beforeAuthHook } from "./auth-hooks";
import { PASSWORD_LENGTH } from "./form-checks";
import { ac, roles } from "./roles";
import { clearSignInFailures } from "./sign-in-throttle";

/** The sign-in service over one database: e-mail and password, sessions stored in the database, roles. */
export function createAuth(db: Database) {
  const { baseURL, secret } = readAuthEnv();
  return betterAuth({
    baseURL,
    secret,
    database: drizzleAdapter(db, { provider: "pg", schema }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: PASSWORD_LENGTH.min,
      maxPasswordLength: PASSWORD_LENGTH.max,
      // Sign-up answers a new address and a taken one alike and signs no one in; the owner of a
      // taken address gets an e-mail instead.
      autoSignIn: false,
      onExistingUserSignUp: async ({ user }) => {
        const link = (path: string) => new URL(path, siteUrl()).toString();
        void sendMessage(user.email, accountExistsEmail({ name: user.name, signInUrl: link("/sign-in"), forgotPasswordUrl: link("/forgot-password") }));
      },
      resetPasswordTokenExpiresIn: RESET_LINK_LIFETIME_SECONDS,
      revokeSessionsOnPasswordReset: true,
      // Not awaited: the answer must take as long for an unknown address as for a known one.
      // sendMessage never throws and logs its own failures.
      sendResetPassword: async ({ user, url }) => {
        void sendMessage(user.email, passwordResetEmail({ name: user.name, link: url }));
      },
      onPasswordReset: async ({ user }) => clearSignInFailures(db, user.email),
    },
    // The auth route writes the client address here, read by the TRUSTED_PROXY_HOPS rule; a value a
    // client sends in this header is overwritten.
    advanced: { ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] } },
    hooks: { before: beforeAuthHook(db), after: afterAuthHook(db) },
    telemetry: { enabled: false },
    plugins: [admin({ ac, roles, defaultRole: "customer", adminRoles: ["admin"] }), nextCookies()],
  });
}

export type Auth = ReturnType<typeof createAuth>;
