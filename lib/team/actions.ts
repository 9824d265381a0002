"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { ROLES } from "@/db/schema";
import { withAction } from "@/lib/auth/action";
import { lineText } from "@/lib/validation/text";
import { changeUserRole } from "./role-change";

const roleChangeSchema = z.object({
  userId: lineText().min(1, "choose an account").max(100),
  role: z.enum(ROLES, { error: "choose customer, staff or admin" }),
});

/** Team page: an admin gives an account another role (never taking away the last admin). */
export const changeRole = withAction({ role: "admin", input: roleChangeSchema }, async ({ db, user, input }) => {
  const result = await changeUserRole(db, user, input.userId, input.role);
  if (result.ok) revalidatePath("/counter/team");
  return result;
});
