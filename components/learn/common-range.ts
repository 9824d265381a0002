/** The rows a long lesson table opens with, so a phone need not scroll through all of them. */
export interface CommonRange<Row> {
  /** Said after the row count while the rest are folded away: "those common on cars and light trucks (60–130)". */
  description: string;
  includes: (row: Row) => boolean;
  /** The control that unfolds the rest: "Show all 280 load indices". */
  showAllLabel: string;
}

/**
 * The keys of the rows folded away: those outside the common range, unless everything is asked for
 * or a search is typed (a search always covers the whole table).
 */
export function foldedKeys<Row extends { key: string }>(
  rows: readonly Row[],
  range: CommonRange<Row> | undefined,
  { query, showAll }: { query: string; showAll: boolean },
): ReadonlySet<string> {
  if (!range || showAll || query.trim()) return new Set();
  return new Set(rows.filter((row) => !range.includes(row)).map((row) => row.key));
}
