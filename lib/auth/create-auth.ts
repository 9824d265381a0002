import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin } from "better-auth/plugins";
import type { Database } from "@/db/client";
import * as schema from "@/db/schema";
import { readAuthEnv } from "./auth-env";
import { ac, roles } from "./roles";

/** The sign-in service over one database: e-mail and password, sessions stored in the database, roles. */
export function createAuth(db: Database) {
  const { baseURL, secret } = readAuthEnv();
  return betterAuth({
    baseURL,
    secret,
    database: drizzleAdapter(db, { provider: "pg", schema }),
    emailAndPassword: { enabled: true, minPasswordLength: 8, maxPasswordLength: 128 },
    telemetry: { enabled: false },
    plugins: [admin({ ac, roles, defaultRole: "customer", adminRoles: ["admin"] }), nextCookies()],
  });
}

export type Auth = ReturnType<typeof createAuth>;
