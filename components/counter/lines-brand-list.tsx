import type { ListedBrand } from "@/lib/brands/brand-bodies";
import { LinesBrandName } from "./lines-brand-name";
import { LinesLine } from "./lines-line";
import { LinesLineAdd } from "./lines-line-add";

/** Every brand with its lines, each with what it is made for and the controls to change it. */
export function LinesBrandList({ brands }: { brands: readonly ListedBrand[] }) {
  if (brands.length === 0) {
    return (
      <div className="rounded border border-dashed border-rule bg-sheet p-6">
        <h2 className="text-xl font-semibold">No brands yet</h2>
        <p className="mt-2 text-ink-soft">Add the first brand above, then its tread lines; items can be added once their line is here.</p>
      </div>
    );
  }
  return (
    <ul aria-label="Brands" className="grid grid-cols-1 items-start gap-6 xl:grid-cols-2">
      {brands.map((brand) => (
        <li key={brand.id}>
          <section aria-labelledby={`brand-${brand.id}-name`} className="flex flex-col gap-3 rounded border border-rule bg-sheet p-4 sm:p-6">
            <LinesBrandName id={brand.id} name={brand.name} headingId={`brand-${brand.id}-name`} />
            {brand.lines.length > 0 ? (
              <ul aria-label={`Lines of ${brand.name}`}>
                {brand.lines.map((line) => (
                  <LinesLine key={line.id} line={line} brandName={brand.name} />
                ))}
              </ul>
            ) : (
              <p className="text-ink-soft">No lines yet.</p>
            )}
            <LinesLineAdd brandId={brand.id} brandName={brand.name} />
          </section>
        </li>
      ))}
    </ul>
  );
}
