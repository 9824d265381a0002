"use client";

import { CAR_LOAD_INDEX_RANGE } from "@/content/learn/ranges";
import { formatLoad, LOAD_INDEX_MAX, LOAD_INDEX_MIN } from "@/lib/tire";
import { loadIndexRows, searchLoadIndices, type LoadIndexRow } from "./load-index-search";
import { TableFinder, type FinderColumn, type FinderFilter } from "./table-finder";

const [carFrom, carTo] = CAR_LOAD_INDEX_RANGE;

const columns: readonly FinderColumn<LoadIndexRow>[] = [
  { label: "Load index", cell: (row) => row.index, isRowHeader: true },
  { label: "Kilograms", cell: (row) => formatLoad(row.kg, "metric"), numeric: true, wideOnly: true },
  { label: "Pounds", cell: (row) => formatLoad(row.kg, "imperial"), numeric: true, wideOnly: true },
  { label: "What it means", cell: (row) => `carries ${formatLoad(row.kg, "metric")} / ${formatLoad(row.kg, "imperial")} per tire` },
];

const filters: readonly FinderFilter<LoadIndexRow>[] = [
  { id: "all", label: `All (${LOAD_INDEX_MIN}\u2060–\u2060${LOAD_INDEX_MAX})`, includes: () => true },
  { id: "cars", label: `Common on cars and light trucks (${carFrom}\u2060–\u2060${carTo})`, includes: (row) => row.index >= carFrom && row.index <= carTo },
];

/** All load indices with their loads, searchable by index, service description or weight. */
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
      filterLegend="Show"
      filters={filters}
    />
  );
}
