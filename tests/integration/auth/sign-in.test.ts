import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { GET as authGet, POST as authPost } from "@/app/api/auth/[...all]/route";
import { getDatabaseHandle, getDb } from "@/lib/database/app-database";
import { account, user } from "@/db/schema";
import { seedDemoAccounts } from "@/lib/demo/accounts";
import { callRoute, signIn } from "../helpers/auth-session";

vi.mock("next/server", async (importOriginal) => ({ ...(await importOriginal<typeof import("next/server")>()), connection: async () => undefined }));

beforeAll(async () => {
  vi.stubEnv("DATABASE_URL", "");
  vi.stubEnv("PGLITE_DATA_DIR", "memory://");
  vi.stubEnv("DEMO_SEED", "off");
  await seedDemoAccounts(await getDb());
});
afterAll(async () => {
  await (await getDatabaseHandle()).close();
  vi.unstubAllEnvs();
});

describe("demo accounts", () => {
  it("exist once each with their roles, even when seeded again", async () => {
    const db = await getDb();
    await seedDemoAccounts(db);
    const rows = await db.select({ email: user.email, role: user.role }).from(user).orderBy(user.email);
    expect(rows).toEqual([
      { email: "admin@sidewise.test", role: "admin" },
      { email: "customer@sidewise.test", role: "customer" },
      { email: "staff@sidewise.test", role: "staff" },
    ]);
    const hashes = await db.select({ password: account.password }).from(account);
    expect(hashes.every((row) => row.password !== null && !row.password.includes("sidewise-demo"))).toBe(true);
  });

  it("sign in with the demo password and get a session that names the role, never a secret", async () => {
    const cookie = await signIn("staff@sidewise.test", "sidewise-demo");
    const response = await callRoute(authGet, "GET", "/api/auth/get-session", { cookie });
    const body = await response.json();
    expect(body.user).toMatchObject({ email: "staff@sidewise.test", role: "staff" });
    expect(JSON.stringify(body)).not.toMatch(/password/i);
  });

  it("refuse a wrong password", async () => {
    await expect(signIn("staff@sidewise.test", "not-the-password")).rejects.toThrow(/401/);
  });

  it("give a new account the customer role, and refuse a sign-up that asks for another", async () => {
    const body = { name: "Pim Castellan", email: "pim@sidewise.test", password: "long-enough-1" };
    const roleOf = async () => (await (await getDb()).select({ role: user.role }).from(user).where(eq(user.email, body.email)))[0];
    const asAdmin = await callRoute(authPost, "POST", "/api/auth/sign-up/email", { body: { ...body, role: "admin" } });
    expect([asAdmin.status, await roleOf()]).toEqual([400, undefined]);
    const plain = await callRoute(authPost, "POST", "/api/auth/sign-up/email", { body });
    expect([plain.status, await roleOf()]).toEqual([200, { role: "customer" }]);
  });
});
