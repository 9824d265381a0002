import type { TeamMember } from "@/lib/team/queries";
import { TeamRoleForm } from "./team-role-form";
import { formatDay } from "@/lib/format/format";

/** The accounts, each with its role form; a search narrows the list when it is long. */
export function TeamTable({ accounts, total, search, currentUserId, timeZone }: { accounts: TeamMember[]; total: number; search?: string; currentUserId: string; timeZone: string }) {
  return (
    <div>
      <form role="search" method="get" className="mb-4 flex max-w-xl flex-wrap items-end gap-2">
        <div className="flex grow flex-col gap-1">
          <label htmlFor="team-search" className="font-semibold">
            Find an account by name or e-mail
          </label>
          <input id="team-search" name="q" type="search" defaultValue={search ?? ""} className="min-h-11 rounded border border-rule bg-sheet px-3" />
        </div>
        <button type="submit" className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet">
          Search
        </button>
      </form>
      <p className="mb-3 text-ink-soft" role="status">
        {total === 0
          ? "No account matches that search."
          : accounts.length < total
            ? `Showing ${accounts.length} of ${total} accounts: search to narrow the list.`
            : `${total} ${total === 1 ? "account" : "accounts"}.`}
      </p>
      {accounts.length > 0 ? (
        <ul className="divide-y divide-rule rounded border border-rule bg-sheet">
          {accounts.map((account) => (
            <li key={account.id} className="grid gap-3 p-4 sm:grid-cols-[1fr_auto] sm:items-start">
              <div className="min-w-0">
                <p className="font-semibold">
                  {account.name}
                  {account.id === currentUserId ? <span className="ml-2 text-sm font-normal text-ink-soft">(you)</span> : null}
                </p>
                <p className="break-all text-ink-soft">{account.email}</p>
                <p className="text-sm text-ink-soft">Joined {formatDay(account.createdAt, { timeZone })}</p>
              </div>
              <TeamRoleForm userId={account.id} email={account.email} role={account.role} />
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
