import Link from "next/link";
import { FormField } from "@/components/ui/form-field";
import { SEASONS, TERRAINS } from "@/lib/tire";
import type { CatalogFilters } from "@/lib/counter/catalog-filters";

const fieldClass = "min-h-11 w-full rounded border border-rule bg-sheet px-3 text-base";
const RIMS = Array.from({ length: 15 }, (_, index) => 13 + index);

/** The table's filters as a plain GET form, so that the address holds them and a link shares them. */
export function CatalogFilterForm({ filters, brands }: { filters: CatalogFilters; brands: string[] }) {
  return (
    <form method="get" action="/counter" role="search" aria-label="Catalog filters" className="grid gap-3 rounded border border-rule bg-sheet p-4 sm:grid-cols-2 lg:grid-cols-6">
      <div className="sm:col-span-2">
        <FormField id="catalog-q" label="Search SKU, size, brand or line">
          {(control) => <input {...control} name="q" type="search" defaultValue={filters.q ?? ""} placeholder="e.g. 265/70R17" className={fieldClass} />}
        </FormField>
      </div>
      <FormField id="catalog-brand" label="Brand">
        {(control) => (
          <select {...control} name="brand" defaultValue={filters.brand ?? ""} className={fieldClass}>
            <option value="">Any brand</option>
            {brands.map((name) => (
              <option key={name}>{name}</option>
            ))}
          </select>
        )}
      </FormField>
      <FormField id="catalog-season" label="Season">
        {(control) => (
          <select {...control} name="season" defaultValue={filters.season ?? ""} className={fieldClass}>
            <option value="">Any season</option>
            {SEASONS.map((season) => (
              <option key={season}>{season}</option>
            ))}
          </select>
        )}
      </FormField>
      <FormField id="catalog-terrain" label="Terrain">
        {(control) => (
          <select {...control} name="terrain" defaultValue={filters.terrain ?? ""} className={fieldClass}>
            <option value="">Any terrain</option>
            {TERRAINS.map((terrain) => (
              <option key={terrain}>{terrain}</option>
            ))}
          </select>
        )}
      </FormField>
      <FormField id="catalog-rim" label="Rim (inches)">
        {(control) => (
          <select {...control} name="rim" defaultValue={filters.rim === undefined ? "" : String(filters.rim)} className={fieldClass}>
            <option value="">Any rim</option>
            {RIMS.map((rim) => (
              <option key={rim}>{rim}</option>
            ))}
          </select>
        )}
      </FormField>
      <FormField id="catalog-stock" label="Stock">
        {(control) => (
          <select {...control} name="stock" defaultValue={filters.stock ?? ""} className={fieldClass}>
            <option value="">Any</option>
            <option value="in">Some on hand</option>
            <option value="out">None on hand</option>
          </select>
        )}
      </FormField>
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
