import { and, eq, sql } from "drizzle-orm";
import type { Database } from "@/db/client";
import { user, type Role } from "@/db/schema";
import type { ActionResult } from "@/lib/auth/action";
import { recordAudit, type Actor } from "@/lib/audit/record";

/**
 * Gives an account another role, in one transaction with its audit entry. The admins' rows are
 * locked first, so that two admins demoting each other at once cannot leave the shop without one.
 */
export async function changeUserRole(db: Database, actor: Actor, userId: string, role: Role): Promise<ActionResult<{ email: string; role: Role }>> {
  return db.transaction(async (tx) => {
    const admins = await tx.select({ id: user.id }).from(user).where(eq(user.role, "admin")).for("update");
    const [target] = await tx.select({ email: user.email, role: user.role }).from(user).where(eq(user.id, userId));
    if (!target) return { ok: false, status: 404, message: "That account no longer exists." };
    if (target.role === role) return { ok: true, data: { email: target.email, role }, message: `${target.email} is already ${role}.` };
    const isLastAdmin = target.role === "admin" && admins.length === 1;
    if (isLastAdmin) {
      return { ok: false, status: 409, message: `${target.email} is the only admin: make another account admin first.` };
    }
    await tx.update(user).set({ role, updatedAt: sql`now()` }).where(and(eq(user.id, userId), eq(user.role, target.role)));
    await recordAudit(tx, actor, [
      {
        action: "role_changed",
        subject: target.email,
        summary: `Role ${target.role} → ${role}`,
        changes: { role: { from: target.role, to: role } },
      },
    ]);
    return { ok: true, data: { email: target.email, role }, message: `${target.email} is now ${role}.` };
  });
}
