import Link from "next/link";

interface CatalogStatusProps {
  added?: string;
  saved?: string;
  retired?: string;
}

/** What the last item form did, said once at the top of the table. */
export function CatalogStatus({ added, saved, retired }: CatalogStatusProps) {
  const sku = added ?? saved ?? retired;
  if (!sku) return null;
  const message = retired
    ? `Retired ${retired}. It no longer shows in the catalog or the Replacement finder; its history stays in the audit log.`
    : added
      ? `Added ${added} to the catalog.`
      : `Saved the changes to ${saved}.`;
  return (
    <div role="status" className="flex flex-wrap items-center gap-x-4 rounded border border-accent bg-accent-soft px-4 py-2">
      <p>{message}</p>
      {retired ? null : (
        <Link href={`/counter/items/${encodeURIComponent(sku)}`} prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
          Open {sku}
        </Link>
      )}
    </div>
  );
}
