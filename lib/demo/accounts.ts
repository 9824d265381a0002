import { inArray } from "drizzle-orm";
import type { Database } from "@/db/client";
import { user, type Role } from "@/db/schema";
import { createAuth } from "@/lib/auth/create-auth";

export const DEMO_PASSWORD = "sidewise-demo";

/** Invented people, one for each role. */
export const DEMO_ACCOUNTS: readonly { email: string; name: string; role: Role }[] = [
  { email: "customer@sidewise.test", name: "Dana Whitlock", role: "customer" },
  { email: "staff@sidewise.test", name: "Ollie Brandvold", role: "staff" },
  { email: "admin@sidewise.test", name: "Marisol Teague", role: "admin" },
];

/**
 * Creates the demo accounts that do not exist yet, through the sign-in service so that passwords
 * are hashed the way it checks them. Running it again changes nothing.
 */
export async function seedDemoAccounts(db: Database): Promise<void> {
  const existing = await db
    .select({ email: user.email })
    .from(user)
    .where(inArray(user.email, DEMO_ACCOUNTS.map((account) => account.email)));
  const missing = DEMO_ACCOUNTS.filter((account) => !existing.some((row) => row.email === account.email));
  if (missing.length === 0) return;
  const auth = createAuth(db);
  for (const account of missing) {
    await auth.api.createUser({ body: { ...account, password: DEMO_PASSWORD } });
  }
}
