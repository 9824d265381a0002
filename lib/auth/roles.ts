import { createAccessControl } from "better-auth/plugins/access";
import { adminAc, defaultStatements } from "better-auth/plugins/admin/access";
import type { Role } from "@/db/schema";

export { ROLES, type Role } from "@/lib/tire";

/** Access control for the admin plugin: only admins manage accounts; staff and customers manage none. */
export const ac = createAccessControl(defaultStatements);

export const roles = {
  customer: ac.newRole({ user: [], session: [] }),
  staff: ac.newRole({ user: [], session: [] }),
  admin: ac.newRole(adminAc.statements),
};

const rank: Record<Role, number> = { customer: 0, staff: 1, admin: 2 };

/** Roles are ordered: admin includes staff, staff includes customer. An unknown role grants nothing. */
export function hasRole(userRole: string | null | undefined, needed: Role): boolean {
  if (typeof userRole !== "string" || !Object.hasOwn(rank, userRole)) return false;
  return rank[userRole as Role] >= rank[needed];
}
