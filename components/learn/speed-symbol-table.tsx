"use client";

import { SLOWEST_ROAD_SPEED_SYMBOL } from "@/content/learn/ranges";
import { formatSpeed } from "@/lib/tire/display";
import { speedSymbolRank } from "@/lib/tire/speed-symbols";
import { searchSpeedSymbols, speedSymbolRows, type SpeedSymbolRow } from "./speed-symbol-search";
import type { CommonRange } from "./common-range";
import type { FinderColumn } from "./finder-table";
import { TableFinder } from "./table-finder";

const bothSpeeds = (row: SpeedSymbolRow) => `${formatSpeed(row.kmh, "metric")} / ${formatSpeed(row.kmh, "imperial")}`;

const columns: readonly FinderColumn<SpeedSymbolRow>[] = [
  { label: "Speed symbol", cell: (row) => row.symbol, isRowHeader: true },
  { label: "km/h", cell: (row) => `${row.above ? "over " : ""}${formatSpeed(row.kmh, "metric")}`, numeric: true, wideOnly: true },
  { label: "mph", cell: (row) => `${row.above ? "over " : ""}${formatSpeed(row.kmh, "imperial")}`, numeric: true, wideOnly: true },
  { label: "What it means", cell: (row) => `built for ${row.above ? "above" : "up to"} ${bothSpeeds(row)}` },
];

const roadRank = speedSymbolRank(SLOWEST_ROAD_SPEED_SYMBOL);

const commonRange: CommonRange<SpeedSymbolRow> = {
  description: `those of cars and light trucks (${SLOWEST_ROAD_SPEED_SYMBOL} and faster); a search covers them all`,
  includes: (row) => speedSymbolRank(row.symbol) >= roadRank,
  showAllLabel: `Show all ${speedSymbolRows.length} speed symbols, slow machines too`,
};

/** Every speed symbol in order of speed, opening at those of cars and light trucks; searchable by letter, service description or speed. */
export function SpeedSymbolTable() {
  return (
    <TableFinder
      caption="Speed symbols (UN R30 / ETRTO), slowest first: ordered by speed, not by letter"
      noun={{ one: "speed symbol", many: "speed symbols" }}
      rows={speedSymbolRows}
      columns={columns}
      search={searchSpeedSymbols}
      searchLabel="Find a speed symbol or a speed"
      searchHint="Type a letter such as H, a service description such as 95H, or a speed such as 210 km/h or 130 mph."
      commonRange={commonRange}
    />
  );
}
