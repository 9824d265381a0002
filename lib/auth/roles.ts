import { createAccessControl } from "better-auth/plugins/access";
import { adminAc, defaultStatements } from "better-auth/plugins/admin/access";

export { hasRole, ROLES, type Role } from "@/lib/tire";

/** Access control for the admin plugin: only admins manage accounts; staff and customers manage none. */
export const ac = createAccessControl(defaultStatements);

export const roles = {
  customer: ac.newRole({ user: [], session: [] }),
  staff: ac.newRole({ user: [], session: [] }),
  admin: ac.newRole(adminAc.statements),
};
