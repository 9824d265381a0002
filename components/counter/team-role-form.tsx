"use client";

import { useActionState } from "react";
import { ROLES, type Role } from "@/lib/tire";
import type { ActionResult } from "@/lib/auth/action";
import { changeRole } from "@/lib/team/actions";

type RoleChangeState = Awaited<ReturnType<typeof changeRole>> | null;

/** One account's role, changed with a server action; the answer is read out next to it. */
export function TeamRoleForm({ userId, email, role }: { userId: string; email: string; role: string }) {
  const [state, submit, pending] = useActionState<RoleChangeState, FormData>((_previous, form) => changeRole(form), null);
  const selectId = `role-${userId}`;
  const statusId = `role-status-${userId}`;
  return (
    <form action={submit} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="userId" value={userId} />
      <label htmlFor={selectId} className="sr-only">
        Role for {email}
      </label>
      <select
        id={selectId}
        name="role"
        defaultValue={ROLES.includes(role as Role) ? role : "customer"}
        aria-describedby={statusId}
        className="min-h-11 rounded border border-rule bg-sheet px-2"
      >
        {ROLES.map((choice) => (
          <option key={choice} value={choice}>
            {choice}
          </option>
        ))}
      </select>
      <button type="submit" disabled={pending} className="min-h-11 rounded border border-accent px-3 font-semibold text-accent disabled:opacity-60">
        {pending ? "Saving…" : "Save role"}
      </button>
      <p id={statusId} role="status" className={`basis-full text-sm ${state && !state.ok ? "text-danger" : "text-ink-soft"}`}>
        {describe(state)}
      </p>
    </form>
  );
}

function describe(state: ActionResult<unknown> | null): string {
  if (!state) return "";
  if (state.ok) return state.message ?? "Saved.";
  return state.fieldErrors ? Object.values(state.fieldErrors).join(" ") : state.message;
}
