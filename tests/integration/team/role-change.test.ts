import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { auditEvent, user } from "@/db/schema";
import { listAuditEvents } from "@/lib/audit/queries";
import { changeUserRole } from "@/lib/team/role-change";
import { listTeam } from "@/lib/team/queries";
import { openTestDatabase, type TestDatabase, testDatabaseKinds } from "../helpers/test-database";

const people = [
  { id: "u-admin", name: "Admin One", email: "one@example.test", role: "admin" },
  { id: "u-staff", name: "Staff Two", email: "two@example.test", role: "staff" },
  { id: "u-customer", name: "Customer 100% Three", email: "three@example.test", role: "customer" },
];
const adminActor = { id: "u-admin", email: "one@example.test" };

describe.each(testDatabaseKinds)("team roles on %s", (kind) => {
  let database: TestDatabase;
  beforeAll(async () => {
    database = await openTestDatabase(kind);
  });
  beforeEach(async () => {
    await database.reset();
    await database.db.insert(user).values(people);
  });
  afterAll(async () => {
    await database?.close();
  });

  const roleOf = async (id: string) => (await database.db.select({ role: user.role }).from(user).where(eq(user.id, id)))[0]?.role;

  it("promotes an account and records who did it", async () => {
    const result = await changeUserRole(database.db, adminActor, "u-staff", "admin");
    expect(result).toMatchObject({ ok: true, data: { email: "two@example.test", role: "admin" } });
    expect(await roleOf("u-staff")).toBe("admin");
    const { events, total } = await listAuditEvents(database.db, { page: 1, action: "role_changed" });
    expect(total).toBe(1);
    expect(events[0]).toMatchObject({ actorEmail: "one@example.test", subject: "two@example.test", summary: "Role staff → admin" });
  });

  it("refuses to demote the last admin, even themselves, and writes nothing", async () => {
    const result = await changeUserRole(database.db, adminActor, "u-admin", "staff");
    expect(result).toMatchObject({ ok: false, status: 409 });
    expect(await roleOf("u-admin")).toBe("admin");
    expect(await database.db.select().from(auditEvent)).toEqual([]);
  });

  it("lets an admin step down once another admin exists", async () => {
    await changeUserRole(database.db, adminActor, "u-staff", "admin");
    expect(await changeUserRole(database.db, adminActor, "u-admin", "customer")).toMatchObject({ ok: true });
    expect(await changeUserRole(database.db, adminActor, "u-staff", "customer")).toMatchObject({ ok: false, status: 409 });
  });

  it("answers 404 for an account that is gone and changes nothing for the same role", async () => {
    expect(await changeUserRole(database.db, adminActor, "u-nobody", "staff")).toMatchObject({ ok: false, status: 404 });
    expect(await changeUserRole(database.db, adminActor, "u-staff", "staff")).toMatchObject({ ok: true });
    expect(await database.db.select().from(auditEvent)).toEqual([]);
  });

  it("lists admins first, then staff, then customers, and searches % literally", async () => {
    const { accounts, total } = await listTeam(database.db, undefined);
    expect(total).toBe(3);
    expect(accounts.map((account) => account.role)).toEqual(["admin", "staff", "customer"]);
    expect((await listTeam(database.db, "100%")).accounts.map((account) => account.id)).toEqual(["u-customer"]);
    expect((await listTeam(database.db, "%")).total).toBe(1);
  });
});
