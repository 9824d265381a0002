import type { LessonTable as LessonTableKind } from "@/content/learn/types";
import { LoadIndexTable } from "./load-index-table";
import { LoadRangeTable } from "./load-range-table";
import { SpeedSymbolTable } from "./speed-symbol-table";

const headings: Record<LessonTableKind, string> = {
  "load-index": "Every load index",
  "speed-symbols": "Every speed symbol",
  "load-range": "Every load range",
};

/** The full table of a lesson, searchable in place. */
export function LessonTable({ kind }: { kind: LessonTableKind }) {
  return (
    <section aria-labelledby="table-heading" className="flex flex-col gap-3">
      <h2 id="table-heading" className="text-xl font-semibold">
        {headings[kind]}
      </h2>
      {kind === "load-index" ? <LoadIndexTable /> : kind === "speed-symbols" ? <SpeedSymbolTable /> : <LoadRangeTable />}
    </section>
  );
}
