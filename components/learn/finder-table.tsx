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

export function FinderTable<Row extends { key: string }>({ id, caption, columns, rows, tags, folded, rowId, emptyHint }: FinderTableProps<Row>) {
  const visibility = (column: FinderColumn<Row>) => (column.wideOnly ? "hidden sm:table-cell" : "");
  const alignment = (column: FinderColumn<Row>) => (column.numeric ? "text-right font-mono" : "text-left");
  // A body cell's look lives in the finder-table rules of globals.css, so that a 280-row table does not
  // repeat it in every cell; only what differs by column is named here.
  const cellClass = (column: FinderColumn<Row>) => [column.numeric && "numeric", column.wideOnly && "wide-only"].filter(Boolean).join(" ") || undefined;
  return (
    <table id={id} className="finder-table w-full border-separate border-spacing-0 rounded border border-rule bg-sheet text-sm">
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
          <tr key={row.key} id={rowId?.(row)} data-row={row.key} data-folded={folded.has(row.key) || undefined}>
            {columns.map((column, index) => {
              const tag = index === columns.length - 1 ? tags.get(row.key) : undefined;
              const className = cellClass(column);
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
                <th key={column.label} scope="row" className={className}>
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
