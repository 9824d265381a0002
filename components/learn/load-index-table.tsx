"use client";

import { CAR_LOAD_INDEX_RANGE } from "@/content/learn/ranges";
import { formatLoad } from "@/lib/tire/display";
import type { CommonRange } from "./common-range";
import type { FinderColumn } from "./finder-table";
import { loadIndexAnchor, loadIndexRows, searchLoadIndices, type LoadIndexRow } from "./load-index-search";
import { TableFinder } from "./table-finder";

const [carFrom, carTo] = CAR_LOAD_INDEX_RANGE;

const columns: readonly FinderColumn<LoadIndexRow>[] = [
  { label: "Load index", cell: (row) => row.index, isRowHeader: true },
  { label: "Kilograms", cell: (row) => formatLoad(row.kg, "metric"), numeric: true, wideOnly: true },
  { label: "Pounds", cell: (row) => formatLoad(row.kg, "imperial"), numeric: true, wideOnly: true },
  { label: "What it means", cell: (row) => `carries ${formatLoad(row.kg, "metric")} / ${formatLoad(row.kg, "imperial")} per tire` },
];

const commonRange: CommonRange<LoadIndexRow> = {
  description: `those common on cars and light trucks (${carFrom}\u2060–\u2060${carTo}); a search covers them all`,
  includes: (row) => row.index >= carFrom && row.index <= carTo,
  showAllLabel: `Show all ${loadIndexRows.length} load indices`,
};

/** Every load index with its load, opening at the range common on cars and light trucks; searchable by index, service description or weight. */
export function LoadIndexTable() {
  return (
    <TableFinder
      caption="Load index table (ISO 4000-1 / ETRTO): the most one tire may carry"
      noun={{ one: "load index", many: "load indices" }}
      rows={loadIndexRows}
      columns={columns}
      search={searchLoadIndices}
      searchLabel="Find a load index or a weight"
      searchHint="Type a load index such as 119, a service description such as 119S, or a weight per tire such as 1360 kg or 2998 lb."
      commonRange={commonRange}
      rowId={(row) => loadIndexAnchor(row.index)}
    />
  );
}
