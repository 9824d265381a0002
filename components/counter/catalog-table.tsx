import Link from "next/link";
import type { CatalogFilters, CatalogTableSort } from "@/lib/counter/catalog-filters";
import { catalogQueryString, type CatalogTableRow } from "@/lib/counter/catalog-table";
import { CatalogInlineEdit } from "./catalog-inline-edit";
import { StockLine } from "@/components/ui/stock-line";

interface Column {
  label: string;
  sort?: CatalogTableSort;
  numeric?: boolean;
}

// Price and quantity come early, so that a phone shows them without scrolling sideways.
const COLUMNS: Column[] = [
  { label: "SKU", sort: "sku" },
  { label: "Size", sort: "size" },
  { label: "Price", sort: "price", numeric: true },
  { label: "Quantity", sort: "quantity", numeric: true },
  { label: "Load index", sort: "loadIndex", numeric: true },
  { label: "Speed", sort: "speed" },
  { label: "Load range / XL" },
  { label: "Brand and line", sort: "brand" },
  { label: "Season · terrain" },
];

function SortHeader({ column, filters }: { column: Column; filters: CatalogFilters }) {
  const align = column.numeric ? "text-right" : "text-left";
  if (!column.sort) return <th scope="col" className={`px-3 py-2 ${align}`}>{column.label}</th>;
  const sorted = filters.sort === column.sort;
  const nextDir = sorted && filters.dir === "asc" ? "desc" : "asc";
  const href = `/counter?${catalogQueryString(filters, { sort: column.sort, dir: nextDir, page: 1 })}`;
  return (
    <th scope="col" aria-sort={sorted ? (filters.dir === "asc" ? "ascending" : "descending") : undefined} className={`px-1 py-0 ${align}`}>
      <Link href={href} prefetch={false} className={`inline-flex min-h-11 items-center gap-1 px-2 underline-offset-4 hover:underline ${sorted ? "text-accent" : ""}`}>
        {column.label}
        <span aria-hidden="true" className="font-mono text-xs">
          {sorted ? (filters.dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
      </Link>
    </th>
  );
}

function loadRangeText(row: CatalogTableRow): string {
  if (row.loadRange) return `Load range ${row.loadRange}`;
  return row.extraLoad ? "XL" : "Standard load";
}

/**
 * One page of catalog items; price and quantity change in place, the rest in the item's form (its SKU
 * links there). The region is `relative` so that the visually hidden labels stay inside it and the
 * page itself never scrolls sideways.
 */
export function CatalogTable({ rows, filters }: { rows: CatalogTableRow[]; filters: CatalogFilters }) {
  return (
    <div role="region" aria-label="Catalog items (scrolls sideways on narrow screens)" tabIndex={0} className="relative overflow-x-auto rounded border border-rule bg-sheet">
      <table className="w-full min-w-[68rem] border-collapse text-sm">
        <thead className="border-b border-rule bg-paper">
          <tr>
            {COLUMNS.map((column) => (
              <SortHeader key={column.label} column={column} filters={filters} />
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.sku} data-sku={row.sku} className="border-b border-grid align-top last:border-b-0">
              <th scope="row" className="px-1 py-1 text-left font-normal">
                <Link href={`/counter/items/${encodeURIComponent(row.sku)}`} prefetch={false} className="inline-flex min-h-11 items-center px-2 font-mono whitespace-nowrap text-accent underline underline-offset-4">
                  <span className="sr-only">Edit </span>
                  {row.sku}
                </Link>
              </th>
              <td className="px-3 py-3 font-mono whitespace-nowrap">{row.designation}</td>
              <td className="px-3 py-1">
                <CatalogInlineEdit sku={row.sku} field="priceCents" value={row.priceCents} label={`Price of ${row.sku} in dollars`} />
              </td>
              <td className="px-3 py-1">
                <CatalogInlineEdit sku={row.sku} field="quantity" value={row.quantity} label={`Quantity of ${row.sku} on hand`} />
                <StockLine quantity={row.sellable} className="pb-2 text-right" />
              </td>
              <td className="px-3 py-3 text-right font-mono">
                {row.loadIndex}
                {row.loadIndexDual === null ? "" : `/${row.loadIndexDual}`}
              </td>
              <td className="px-3 py-3 font-mono">{row.speedSymbol}</td>
              <td className="px-3 py-3">{loadRangeText(row)}</td>
              <td className="px-3 py-3">
                <span className="font-semibold">{row.brand}</span> {row.line}
              </td>
              <td className="px-3 py-3">
                {row.season} · {row.terrain}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
