"use client";

import { formatPressure } from "@/lib/tire/display";
import { psiToKpa } from "@/lib/tire/units";
import { loadRangeRows, searchLoadRanges, type LoadRangeRow } from "./load-range-search";
import type { FinderColumn } from "./finder-table";
import { TableFinder } from "./table-finder";

function typicalPressure(row: LoadRangeRow): string | null {
  if (row.typicalMaxPsi === null) return null;
  const kPa = psiToKpa(row.typicalMaxPsi);
  return `${formatPressure(kPa, "imperial")} / ${formatPressure(kPa, "metric")}`;
}

const lightestTypicalPly = Math.min(...loadRangeRows.filter((row) => row.typicalMaxPsi !== null).map((row) => row.plyRating));

const columns: readonly FinderColumn<LoadRangeRow>[] = [
  { label: "Load range", cell: (row) => row.loadRange, isRowHeader: true },
  { label: "Ply rating", cell: (row) => row.plyRating, numeric: true },
  {
    label: "Typical LT maximum (common practice)",
    cell: (row) =>
      typicalPressure(row) ?? (
        <>
          <span aria-hidden="true">—</span>
          <span className="sr-only">not listed</span>
        </>
      ),
    wideOnly: true,
  },
  {
    label: "What it means",
    cell: (row) => {
      const pressure = typicalPressure(row);
      const rating = `${row.plyRating}-ply rating`;
      if (pressure) return `${rating}; LT tires of this range typically take up to ${pressure} cold`;
      return `${rating}; ${row.plyRating < lightestTypicalPly ? "lighter" : "heavier-duty"} than the usual LT ranges`;
    },
  },
];

/** Every load range with its ply rating and, where known, the typical LT maximum pressure. */
export function LoadRangeTable() {
  return (
    <TableFinder
      caption="Load ranges and ply ratings (TRA); pressures are typical, the sidewall governs"
      noun={{ one: "load range", many: "load ranges" }}
      rows={loadRangeRows}
      columns={columns}
      search={searchLoadRanges}
      searchLabel="Find a load range or a ply rating"
      searchHint="Type a letter such as E, or a ply rating such as 10 or 10 PR."
    />
  );
}
