import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin } from "better-auth/plugins";
import type { Database } from "@/db/client";
import * as schema from "@/db/schema";
import { passwordResetEmail, RESET_LINK_LIFETIME_SECONDS } from "@/lib/email/password-reset-email";
import { sendEmail } from "@/lib/email/send-email";
import { readAuthEnv } from "./auth-env";
import { ac, roles } from "./roles";

/** The sign-in service over one database: e-mail and password, sessions stored in the database, roles. */
export function createAuth(db: Database) {
  const { baseURL, secret } = readAuthEnv();
  return betterAuth({
    baseURL,
    secret,
    database: drizzleAdapter(db, { provider: "pg", schema }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: 8,
      maxPasswordLength: 128,
      resetPasswordTokenExpiresIn: RESET_LINK_LIFETIME_SECONDS,
      revokeSessionsOnPasswordReset: true,
      // Not awaited: the answer must take as long for an unknown address as for a known one.
      // sendEmail never throws and logs its own failures.
      sendResetPassword: async ({ user, url }) => {
        void sendEmail({ to: user.email, ...passwordResetEmail({ name: user.name, link: url }) });
      },
    },
    telemetry: { enabled: false },
    plugins: [admin({ ac, roles, defaultRole: "customer", adminRoles: ["admin"] }), nextCookies()],
  });
}

export type Auth = ReturnType<typeof createAuth>;
