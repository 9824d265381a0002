import Link from "next/link";
import type { CatalogFilters, CatalogTableSort } from "@/lib/counter/catalog-filters";
import { catalogQueryString, type CatalogTableRow } from "@/lib/counter/catalog-table";
import { CatalogInlineEdit } from "./catalog-inline-edit";
import { StockLine } from "@/components/ui/stock-line";

interface Column {
  label: string;
  /** The header on a narrow screen, where this column carries more than its wide label says. */
  narrowLabel?: string;
  sort?: CatalogTableSort;
  numeric?: boolean;
  /** Shown as its own column on wide screens only; narrow screens fold it into the item's cell. */
  wideOnly?: boolean;
}

// Price and quantity come early, so that they sit beside the item on every screen.
const COLUMNS: Column[] = [
  { label: "SKU", narrowLabel: "Item", sort: "sku" },
  { label: "Size", sort: "size", wideOnly: true },
  { label: "Price", sort: "price", numeric: true },
  { label: "Quantity", sort: "quantity", numeric: true },
  { label: "Load index", sort: "loadIndex", numeric: true, wideOnly: true },
  { label: "Speed", sort: "speed", wideOnly: true },
  { label: "Load range / XL", wideOnly: true },
  { label: "Brand and line", sort: "brand", wideOnly: true },
  { label: "Season · terrain", wideOnly: true },
];

const wideOnly = "hidden lg:table-cell";

function ColumnLabel({ column }: { column: Column }) {
  if (!column.narrowLabel) return <>{column.label}</>;
  return (
    <>
      <span className="lg:hidden">{column.narrowLabel}</span>
      <span className="hidden lg:inline">{column.label}</span>
    </>
  );
}

function SortHeader({ column, filters }: { column: Column; filters: CatalogFilters }) {
  const align = column.numeric ? "text-right" : "text-left";
  const shown = column.wideOnly ? wideOnly : "";
  if (!column.sort) {
    return (
      <th scope="col" className={`px-3 py-2 ${align} ${shown}`}>
        <ColumnLabel column={column} />
      </th>
    );
  }
  const sorted = filters.sort === column.sort;
  const nextDir = sorted && filters.dir === "asc" ? "desc" : "asc";
  const href = `/counter?${catalogQueryString(filters, { sort: column.sort, dir: nextDir, page: 1 })}`;
  return (
    <th scope="col" aria-sort={sorted ? (filters.dir === "asc" ? "ascending" : "descending") : undefined} className={`px-1 py-0 ${align} ${shown}`}>
      <Link href={href} prefetch={false} className={`inline-flex min-h-11 items-center gap-1 px-1 underline-offset-4 hover:underline lg:px-2 ${sorted ? "text-accent" : ""}`}>
        <ColumnLabel column={column} />
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

const loadIndexText = (row: CatalogTableRow): string => `${row.loadIndex}${row.loadIndexDual === null ? "" : `/${row.loadIndexDual}`}`;

/** The item's cell on a narrow screen: size and load/speed first, its SKU (the link to its form), then the rest in a details line. */
function ItemCell({ row }: { row: CatalogTableRow }) {
  return (
    <th scope="row" className="px-1 py-1 text-left align-top font-normal">
      <span className="block px-1 pt-2 font-mono font-semibold lg:hidden">
        <span className="whitespace-nowrap">{row.designation}</span> <span className="whitespace-nowrap">{`${loadIndexText(row)}${row.speedSymbol}`}</span>
      </span>
      <Link
        href={`/counter/items/${encodeURIComponent(row.sku)}`}
        prefetch={false}
        className="inline-flex min-h-11 items-center px-1 font-mono break-all text-accent underline underline-offset-4 lg:px-2 lg:break-normal lg:whitespace-nowrap"
      >
        <span className="sr-only">Edit </span>
        {row.sku}
      </Link>
      <span className="block px-1 pb-2 text-xs text-ink-soft lg:hidden">
        {row.brand} {row.line} · {row.season} · {row.terrain} · {loadRangeText(row)}
      </span>
    </th>
  );
}

/**
 * One page of catalog items; price and quantity change in place, the rest in the item's form (its SKU
 * links there). Below the `lg` breakpoint the item, its price and its quantity are the only columns,
 * so a phone shows them without scrolling sideways. The region is `relative` so that the visually
 * hidden labels stay inside it.
 */
export function CatalogTable({ rows, filters }: { rows: CatalogTableRow[]; filters: CatalogFilters }) {
  return (
    <div role="region" aria-label="Catalog items" tabIndex={0} className="relative overflow-x-auto rounded border border-rule bg-sheet">
      <table className="w-full border-collapse text-sm">
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
              <ItemCell row={row} />
              <td className={`px-3 py-3 font-mono whitespace-nowrap ${wideOnly}`}>{row.designation}</td>
              <td className="px-1 py-1 lg:px-3">
                <CatalogInlineEdit sku={row.sku} field="priceCents" value={row.priceCents} label={`Price of ${row.sku} in dollars`} />
              </td>
              <td className="px-1 py-1 lg:px-3">
                <CatalogInlineEdit sku={row.sku} field="quantity" value={row.quantity} label={`Quantity of ${row.sku} on hand`} />
                <StockLine quantity={row.sellable} className="pb-2 text-right" />
              </td>
              <td className={`px-3 py-3 text-right font-mono ${wideOnly}`}>{loadIndexText(row)}</td>
              <td className={`px-3 py-3 font-mono ${wideOnly}`}>{row.speedSymbol}</td>
              <td className={`px-3 py-3 ${wideOnly}`}>{loadRangeText(row)}</td>
              <td className={`px-3 py-3 ${wideOnly}`}>
                <span className="font-semibold">{row.brand}</span> {row.line}
              </td>
              <td className={`px-3 py-3 ${wideOnly}`}>
                {row.season} · {row.terrain}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
