import type { ReactNode } from "react";

export interface FinderColumn<Row> {
  label: string;
  cell: (row: Row) => ReactNode;
  /** The cell that names the row, read out before the other cells of that row. */
  isRowHeader?: boolean;
  numeric?: boolean;
  /** Shown from the small breakpoint up; the meaning column repeats it on phones. */
  wideOnly?: boolean;
}

interface FinderTableProps<Row extends { key: string }> {
  id: string;
  caption: string;
  columns: readonly FinderColumn<Row>[];
  rows: readonly Row[];
  tags: ReadonlyMap<string, string>;
  /** Rows kept in the page but folded away until asked for, or until their anchor is followed. */
  folded: ReadonlySet<string>;
  /** The anchor of a row, so a link can point at it: "load-index-150". */
  rowId?: (row: Row) => string;
  emptyHint: string;
}

// A folded row shows as soon as its anchor is the page's target, when the "show all" box is ticked (even
// before the page is interactive) and on paper.
const rowClass =
  "scroll-mt-16 target:bg-accent-soft data-folded:hidden data-folded:target:table-row data-folded:group-has-[[data-show-all]:checked]/finder:table-row data-folded:print:table-row";

export function FinderTable<Row extends { key: string }>({ id, caption, columns, rows, tags, folded, rowId, emptyHint }: FinderTableProps<Row>) {
  const visibility = (column: FinderColumn<Row>) => (column.wideOnly ? "hidden sm:table-cell" : "");
  const alignment = (column: FinderColumn<Row>) => (column.numeric ? "text-right font-mono" : "text-left");
  return (
    <table id={id} className="w-full border-separate border-spacing-0 rounded border border-rule bg-sheet text-sm">
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
          <tr key={row.key} id={rowId?.(row)} data-row={row.key} data-folded={folded.has(row.key) || undefined} className={rowClass}>
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
