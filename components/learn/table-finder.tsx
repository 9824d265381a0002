import { useId, useMemo, useState, useSyncExternalStore, type ReactNode } from "react";
import type { SearchOutcome } from "./search-terms";

// Rendered inside the lesson tables' client components, which pass it functions; it holds no
// "use client" of its own because it is never rendered straight from the server.

export interface FinderColumn<Row> {
  label: string;
  cell: (row: Row) => ReactNode;
  /** The cell that names the row, read out before the other cells of that row. */
  isRowHeader?: boolean;
  numeric?: boolean;
  /** Shown from the small breakpoint up; the meaning column repeats it on phones. */
  wideOnly?: boolean;
}

export interface FinderFilter<Row> {
  id: string;
  label: string;
  includes: (row: Row) => boolean;
}

interface TableFinderProps<Row extends { key: string }> {
  caption: string;
  noun: { one: string; many: string };
  rows: readonly Row[];
  columns: readonly FinderColumn<Row>[];
  search: (query: string) => SearchOutcome;
  searchLabel: string;
  searchHint: string;
  filterLegend?: string;
  filters?: readonly FinderFilter<Row>[];
}

const noSubscription = () => () => {};

/**
 * A table from the tire core, filtered in place as a person types. The server renders every row,
 * so the whole table reads without JavaScript; the controls wake up once the page is interactive.
 */
export function TableFinder<Row extends { key: string }>(props: TableFinderProps<Row>) {
  const { caption, noun, rows, columns, search, searchLabel, searchHint, filterLegend, filters = [] } = props;
  const id = useId();
  const interactive = useSyncExternalStore(noSubscription, () => true, () => false);
  const [query, setQuery] = useState("");
  const [filterId, setFilterId] = useState(filters[0]?.id ?? "");
  const outcome = useMemo(() => search(query), [search, query]);
  const filter = filters.find((option) => option.id === filterId);
  const shown = rows.filter((row) => (outcome.keys?.has(row.key) ?? true) && (filter?.includes(row) ?? true));
  const total = `${rows.length} ${rows.length === 1 ? noun.one : noun.many}`;

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-col gap-3 rounded border border-rule bg-sheet p-3 sm:flex-row sm:flex-wrap sm:items-end sm:gap-6 print:hidden">
        <div className="flex min-w-0 flex-1 flex-col gap-1 sm:min-w-64">
          <label htmlFor={`${id}-search`} className="font-semibold">
            {searchLabel}
          </label>
          <input
            id={`${id}-search`}
            type="search"
            value={query}
            onChange={(event) => setQuery(event.target.value)}
            disabled={!interactive}
            autoComplete="off"
            spellCheck={false}
            aria-describedby={`${id}-hint`}
            className="min-h-11 w-full rounded border-2 border-ink/70 bg-paper px-3 font-mono text-lg text-ink focus:border-accent focus:outline-none disabled:border-rule"
          />
          <p id={`${id}-hint`} className="text-sm text-ink-soft">
            {searchHint}
          </p>
        </div>
        {filters.length > 1 ? (
          <fieldset className="flex flex-col gap-1" disabled={!interactive}>
            <legend className="mb-1 font-semibold">{filterLegend}</legend>
            <div className="flex flex-wrap gap-2">
              {filters.map((option) => (
                <label
                  key={option.id}
                  className="inline-flex min-h-11 cursor-pointer items-center gap-2 rounded border border-rule px-3 text-sm has-checked:border-accent has-checked:bg-accent-soft has-checked:font-semibold has-focus-visible:outline-2 has-focus-visible:outline-accent"
                >
                  <input
                    type="radio"
                    name={`${id}-filter`}
                    value={option.id}
                    checked={filterId === option.id}
                    onChange={() => setFilterId(option.id)}
                    className="size-4 accent-accent"
                  />
                  {option.label}
                </label>
              ))}
            </div>
          </fieldset>
        ) : null}
      </div>
      <div role="status" className="text-sm">
        <p className="font-semibold">
          Showing {shown.length} of {total}
        </p>
        {outcome.notes.map((note) => (
          <p key={note} className="text-ink-soft">
            {note}
          </p>
        ))}
      </div>
      <FinderTable caption={caption} columns={columns} rows={shown} tags={outcome.tags} emptyHint={searchHint} />
    </div>
  );
}

interface FinderTableProps<Row extends { key: string }> {
  caption: string;
  columns: readonly FinderColumn<Row>[];
  rows: readonly Row[];
  tags: ReadonlyMap<string, string>;
  emptyHint: string;
}

function FinderTable<Row extends { key: string }>({ caption, columns, rows, tags, emptyHint }: FinderTableProps<Row>) {
  const visibility = (column: FinderColumn<Row>) => (column.wideOnly ? "hidden sm:table-cell" : "");
  const alignment = (column: FinderColumn<Row>) => (column.numeric ? "text-right font-mono" : "text-left");
  return (
    <table className="w-full border-separate border-spacing-0 rounded border border-rule bg-sheet text-sm">
      <caption className="mb-2 text-left text-xs tracking-wide text-ink-soft uppercase">{caption}</caption>
      <thead>
        <tr>
          {columns.map((column) => (
            <th
              key={column.label}
              scope="col"
              className={`sticky top-0 z-10 bg-sheet px-3 py-2 font-semibold shadow-[inset_0_-2px_0_var(--color-ink-soft)] print:static ${alignment(column)} ${visibility(column)}`}
            >
              {column.label}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.key} data-row={row.key}>
            {columns.map((column, index) => {
              const tag = index === columns.length - 1 ? tags.get(row.key) : undefined;
              const className = `border-t border-rule px-3 py-1.5 align-top ${alignment(column)} ${visibility(column)}`;
              const content = (
                <>
                  {column.cell(row)}
                  {tag ? (
                    <>
                      {" "}
                      <span className="inline-block rounded bg-accent-soft px-1.5 text-xs font-semibold text-accent">{tag}</span>
                    </>
                  ) : null}
                </>
              );
              return column.isRowHeader ? (
                <th key={column.label} scope="row" className={`${className} font-mono text-base font-semibold`}>
                  {content}
                </th>
              ) : (
                <td key={column.label} className={className}>
                  {content}
                </td>
              );
            })}
          </tr>
        ))}
        {rows.length === 0 ? (
          <tr>
            <td colSpan={columns.length} className="border-t border-rule px-3 py-3 text-ink-soft">
              Nothing matches. {emptyHint}
            </td>
          </tr>
        ) : null}
      </tbody>
    </table>
  );
}
