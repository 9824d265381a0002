import Link from "next/link";
import { QUOTE_STATUSES, type OfferStatus, type QuoteStatus } from "@/lib/tire";
import { OfferStatusBadge } from "./offer-status-badge";
import { sourceLabels, statusLabels } from "@/lib/quotes/labels";
import type { QuoteRequestListing, RequestListQuery } from "@/lib/quotes/queries";
import { formatCount, formatDateTime, shopTimesCaption } from "@/lib/format/format";

const linkClass = "inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4";

function listHref(status: QuoteStatus | undefined, page = 1): string {
  const params = new URLSearchParams();
  if (status) params.set("status", status);
  if (page > 1) params.set("page", String(page));
  const search = params.toString();
  return search ? `/counter/requests?${search}` : "/counter/requests";
}

const statusBadge: Record<QuoteStatus, string> = {
  new: "border-accent bg-accent-soft text-ink",
  answered: "border-rule bg-sheet text-ink",
  offered: "border-ink bg-sheet text-ink",
  closed: "border-rule bg-paper text-ink-soft",
};

export function RequestStatusBadge({ status }: { status: QuoteStatus }) {
  return <span className={`inline-block rounded border px-2 py-0.5 text-sm font-semibold ${statusBadge[status]}`}>{statusLabels[status]}</span>;
}

interface RequestListProps {
  listing: QuoteRequestListing;
  query: RequestListQuery;
  timeZone: string;
  /** Each listed request's latest offer's status, when it has one. */
  offerStatuses: ReadonlyMap<number, OfferStatus>;
}

/** The inbox: a filter per status with its count (kept in the address), then the requests, newest first, each with its latest offer's status. */
export function RequestList({ listing, query, timeZone, offerStatuses }: RequestListProps) {
  const all = QUOTE_STATUSES.reduce((sum, status) => sum + listing.counts[status], 0);
  const filters: { status: QuoteStatus | undefined; label: string; count: number }[] = [
    { status: undefined, label: "All", count: all },
    ...QUOTE_STATUSES.map((status) => ({ status, label: statusLabels[status], count: listing.counts[status] })),
  ];
  return (
    <div>
      <nav aria-label="Requests by status" className="mb-4">
        <ul className="flex flex-wrap gap-2">
          {filters.map((filter) => {
            const current = filter.status === query.status;
            return (
              <li key={filter.label}>
                <Link
                  href={listHref(filter.status)}
                  prefetch={false}
                  aria-current={current ? "page" : undefined}
                  className={`inline-flex min-h-11 items-center gap-2 rounded border px-3 font-semibold ${current ? "border-accent bg-accent text-sheet" : "border-rule bg-sheet text-accent"}`}
                >
                  {filter.label} <span className="font-mono">{filter.count}</span>
                </Link>
              </li>
            );
          })}
        </ul>
      </nav>
      <p role="status" className="mb-3 text-ink-soft">
        {listing.total === 0
          ? query.status ? `No ${statusLabels[query.status].toLowerCase()} requests.` : "No requests yet. They arrive here from “Ask the shop” on the Size sheet, the finder and Fit cards."
          : `${formatCount(listing.total)} ${listing.total === 1 ? "request" : "requests"} · page ${listing.page} of ${listing.pageCount} · newest first · ${shopTimesCaption(timeZone)}`}
      </p>
      {listing.requests.length > 0 ? (
        <ul className="flex flex-col gap-2">
          {listing.requests.map((request) => (
            <li key={request.id} className="rounded border border-rule bg-sheet p-3">
              <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
                <Link href={`/counter/requests/${request.id}`} prefetch={false} className={`${linkClass} break-all`}>
                  #{request.id} · {request.name}
                </Link>
                <span className="flex flex-wrap gap-2">
                  <RequestStatusBadge status={request.status} />
                  {offerStatuses.has(request.id) ? <OfferStatusBadge status={offerStatuses.get(request.id)!} prefix="Offer:" /> : null}
                </span>
              </div>
              <p className="mt-1 break-words">
                {request.quantity} × {request.tires}
              </p>
              <p className="text-sm text-ink-soft">
                {request.vehicle} · {sourceLabels[request.source]} · <time dateTime={request.createdAt.toISOString()}>{formatDateTime(request.createdAt, { timeZone })}</time>
                {request.preferredDay ? ` · would like ${request.preferredDay}` : ""}
              </p>
            </li>
          ))}
        </ul>
      ) : null}
      {listing.pageCount > 1 ? (
        <nav aria-label="Request pages" className="mt-4 flex gap-4">
          {listing.page > 1 ? (
            <Link href={listHref(query.status, listing.page - 1)} prefetch={false} className={linkClass}>
              Newer requests
            </Link>
          ) : null}
          {listing.page < listing.pageCount ? (
            <Link href={listHref(query.status, listing.page + 1)} prefetch={false} className={linkClass}>
              Older requests
            </Link>
          ) : null}
        </nav>
      ) : null}
    </div>
  );
}
