import { useId, useMemo, useState, useSyncExternalStore } from "react";
import { foldedKeys, type CommonRange } from "./common-range";
import { FinderTable, type FinderColumn } from "./finder-table";
import type { SearchOutcome } from "./search-terms";

// Rendered inside the lesson tables' client components, which pass it functions; it holds no
// "use client" of its own because it is never rendered straight from the server.

interface TableFinderProps<Row extends { key: string }> {
  caption: string;
  noun: { one: string; many: string };
  rows: readonly Row[];
  columns: readonly FinderColumn<Row>[];
  search: (query: string) => SearchOutcome;
  searchLabel: string;
  searchHint: string;
  commonRange?: CommonRange<Row>;
  rowId?: (row: Row) => string;
}

const noSubscription = () => () => {};

/**
 * A table of trade figures, filtered in place as a person types. The server renders every row, so
 * the whole table is in the page without JavaScript; the search wakes up once the page is
 * interactive. A long table opens at its common range, the rest folded away until asked for.
 */
export function TableFinder<Row extends { key: string }>(props: TableFinderProps<Row>) {
  const { caption, noun, rows, columns, search, searchLabel, searchHint, commonRange, rowId } = props;
  const id = useId();
  const interactive = useSyncExternalStore(noSubscription, () => true, () => false);
  const [query, setQuery] = useState("");
  const outcome = useMemo(() => search(query), [search, query]);
  const [showAll, setShowAll] = useState(false);
  const matching = rows.filter((row) => outcome.keys?.has(row.key) ?? true);
  const folded = foldedKeys(matching, commonRange, { query, showAll });
  const total = `${rows.length} ${rows.length === 1 ? noun.one : noun.many}`;

  return (
    <div className="group/finder flex flex-col gap-3">
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
        {commonRange ? (
          <label className="inline-flex min-h-11 cursor-pointer items-center gap-2 self-start rounded border border-rule px-3 text-sm has-checked:border-accent has-checked:bg-accent-soft has-checked:font-semibold has-focus-visible:outline-2 has-focus-visible:outline-accent sm:self-end">
            <input type="checkbox" data-show-all aria-controls={`${id}-table`} onChange={(event) => setShowAll(event.target.checked)} className="size-4 accent-accent" />
            {commonRange.showAllLabel}
          </label>
        ) : null}
      </div>
      <div role="status" className="text-sm">
        <p className="font-semibold">
          Showing {matching.length - folded.size} of {total}
          {folded.size > 0 ? `: ${commonRange!.description}` : null}
        </p>
        {outcome.notes.map((note) => (
          <p key={note} className="text-ink-soft">
            {note}
          </p>
        ))}
      </div>
      <FinderTable id={`${id}-table`} caption={caption} columns={columns} rows={matching} tags={outcome.tags} folded={folded} rowId={rowId} emptyHint={searchHint} />
    </div>
  );
}
