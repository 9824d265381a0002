import Link from "next/link";
import type { ReactNode } from "react";
import { SEASONS, TERRAINS } from "@/lib/tire";
import type { CatalogFilters } from "@/lib/counter/catalog-filters";

const fieldClass = "min-h-11 w-full rounded border border-rule bg-sheet px-3 text-base";
const RIMS = Array.from({ length: 15 }, (_, index) => 13 + index);

function Field({ label, htmlFor, children }: { label: string; htmlFor: string; children: ReactNode }) {
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={htmlFor} className="text-sm font-semibold">
        {label}
      </label>
      {children}
    </div>
  );
}

/** The table's filters as a plain GET form, so that the address holds them and a link shares them. */
export function CatalogFilterForm({ filters, brands }: { filters: CatalogFilters; brands: string[] }) {
  return (
    <form method="get" action="/counter" role="search" aria-label="Catalog filters" className="grid gap-3 rounded border border-rule bg-sheet p-4 sm:grid-cols-2 lg:grid-cols-6">
      <div className="sm:col-span-2">
        <Field label="Search SKU, size, brand or line" htmlFor="catalog-q">
          <input id="catalog-q" name="q" type="search" defaultValue={filters.q ?? ""} placeholder="e.g. 265/70R17" className={fieldClass} />
        </Field>
      </div>
      <Field label="Brand" htmlFor="catalog-brand">
        <select id="catalog-brand" name="brand" defaultValue={filters.brand ?? ""} className={fieldClass}>
          <option value="">Any brand</option>
          {brands.map((name) => (
            <option key={name}>{name}</option>
          ))}
        </select>
      </Field>
      <Field label="Season" htmlFor="catalog-season">
        <select id="catalog-season" name="season" defaultValue={filters.season ?? ""} className={fieldClass}>
          <option value="">Any season</option>
          {SEASONS.map((season) => (
            <option key={season}>{season}</option>
          ))}
        </select>
      </Field>
      <Field label="Terrain" htmlFor="catalog-terrain">
        <select id="catalog-terrain" name="terrain" defaultValue={filters.terrain ?? ""} className={fieldClass}>
          <option value="">Any terrain</option>
          {TERRAINS.map((terrain) => (
            <option key={terrain}>{terrain}</option>
          ))}
        </select>
      </Field>
      <Field label="Rim (inches)" htmlFor="catalog-rim">
        <select id="catalog-rim" name="rim" defaultValue={filters.rim === undefined ? "" : String(filters.rim)} className={fieldClass}>
          <option value="">Any rim</option>
          {RIMS.map((rim) => (
            <option key={rim}>{rim}</option>
          ))}
        </select>
      </Field>
      <Field label="Stock" htmlFor="catalog-stock">
        <select id="catalog-stock" name="stock" defaultValue={filters.stock ?? ""} className={fieldClass}>
          <option value="">In or out of stock</option>
          <option value="in">In stock</option>
          <option value="out">Out of stock</option>
        </select>
      </Field>
      {filters.sort !== "sku" ? <input type="hidden" name="sort" value={filters.sort} /> : null}
      {filters.dir !== "asc" ? <input type="hidden" name="dir" value={filters.dir} /> : null}
      <div className="flex items-end gap-4 sm:col-span-2 lg:col-span-1">
        <button type="submit" className="min-h-11 rounded bg-accent px-4 font-semibold whitespace-nowrap text-sheet hover:opacity-90">
          Show items
        </button>
        <Link href="/counter" prefetch={false} className="inline-flex min-h-11 items-center font-semibold text-accent underline underline-offset-4">
          Clear
        </Link>
      </div>
    </form>
  );
}
