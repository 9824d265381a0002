import Link from "next/link";
import { AUDIT_ACTIONS, type AuditAction } from "@/lib/tire";
import { AUDIT_PAGE_SIZE, type AuditListing, type AuditQuery } from "@/lib/audit/queries";
import { formatCount, formatDateTime, shopTimesCaption } from "@/lib/format/format";

const actionLabels: Record<AuditAction, string> = {
  item_added: "Item added",
  item_changed: "Item changed",
  item_retired: "Item retired",
  catalog_import: "Catalog import",
  role_changed: "Role changed",
  shop_changed: "Shop settings changed",
  brand_added: "Brand added",
  brand_renamed: "Brand renamed",
  line_added: "Line added",
  line_changed: "Line changed",
  fit_card_emailed: "Fit card e-mailed",
  request_replied: "Request answered",
  offer_sent: "Offer sent",
  offer_withdrawn: "Offer withdrawn",
  fitting_fitted: "Fitting done",
  fitting_no_show: "Fitting missed",
  fitting_cancelled: "Fitting cancelled",
};

function pageHref(query: AuditQuery, page: number): string {
  const params = new URLSearchParams();
  if (query.action) params.set("action", query.action);
  if (page > 1) params.set("page", String(page));
  const search = params.toString();
  return search ? `/counter/audit?${search}` : "/counter/audit";
}

/** The log as a table (scrolling sideways on a phone), a filter by kind of change, and pages. */
export function AuditLog({ listing, query, timeZone }: { listing: AuditListing; query: AuditQuery; timeZone: string }) {
  const pages = Math.max(1, Math.ceil(listing.total / AUDIT_PAGE_SIZE));
  return (
    <div>
      <form method="get" className="mb-4 flex flex-wrap items-end gap-2">
        <div className="flex flex-col gap-1">
          <label htmlFor="audit-action" className="font-semibold">
            Kind of change
          </label>
          <select id="audit-action" name="action" defaultValue={query.action ?? ""} className="min-h-11 rounded border border-rule bg-sheet px-2">
            <option value="">All changes</option>
            {AUDIT_ACTIONS.map((action) => (
              <option key={action} value={action}>
                {actionLabels[action]}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet">
          Show
        </button>
      </form>
      <p role="status" className="mb-3 text-ink-soft">
        {listing.total === 0 ? "Nothing has been recorded yet." : `${formatCount(listing.total)} entries · page ${query.page} of ${pages} · ${shopTimesCaption(timeZone)}`}
      </p>
      {listing.events.length > 0 ? (
        <div role="region" aria-label="Audit entries" tabIndex={0} className="overflow-x-auto rounded border border-rule bg-sheet">
          <table className="w-full min-w-[40rem] text-left">
            <thead className="border-b border-rule text-sm text-ink-soft">
              <tr>
                <th scope="col" className="p-3">When</th>
                <th scope="col" className="p-3">Who</th>
                <th scope="col" className="p-3">What</th>
                <th scope="col" className="p-3">Item or account</th>
                <th scope="col" className="p-3">Change</th>
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {listing.events.map((event) => (
                <tr key={event.id} className="align-top">
                  <td className="p-3 whitespace-nowrap">
                    <time dateTime={event.at.toISOString()}>{formatDateTime(event.at, { timeZone })}</time>
                  </td>
                  <td className="p-3 break-all">{event.actorEmail}</td>
                  <td className="p-3 whitespace-nowrap">{actionLabels[event.action]}</td>
                  <td className="p-3 font-mono text-sm break-all">{event.subject}</td>
                  <td className="p-3">{event.summary}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      {pages > 1 ? (
        <nav aria-label="Audit log pages" className="mt-4 flex gap-4">
          {query.page > 1 ? (
            <Link href={pageHref(query, query.page - 1)} prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
              Newer entries
            </Link>
          ) : null}
          {query.page < pages ? (
            <Link href={pageHref(query, query.page + 1)} prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
              Older entries
            </Link>
          ) : null}
        </nav>
      ) : null}
    </div>
  );
}
