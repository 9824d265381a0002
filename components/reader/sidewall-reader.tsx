"use client";

import { useEffect, useMemo, useState } from "react";
import { UnitsToggle } from "@/components/units/units-toggle";
import { useUnitSystem } from "@/components/units/use-unit-system";
import { describeMarking, type SidewallPartKey } from "@/lib/tire/describe";
import type { ParseResult } from "@/lib/tire/types";
import { MarkedEcho } from "./marked-echo";
import { MarkingInput } from "./marking-input";
import { NextSteps } from "./next-steps";
import { PartList } from "./part-list";
import { ReaderStatus } from "./reader-status";
import { ReaderFigure } from "./reader-figure";
import { useOnDemand } from "./use-on-demand";

const fetchParser = () => import("@/lib/tire/parse/parse-marking");

interface SidewallReaderProps {
  initialText: string;
  /** The server's reading of `initialText`, shown until the reader itself arrives. */
  initialResult: ParseResult;
}

/**
 * Reads the sidewall as it is typed, in the browser: no request leaves the page per keystroke. The
 * reader is fetched when the visitor first focuses or types; until then the server's reading shows.
 */
export function SidewallReader({ initialText, initialResult }: SidewallReaderProps) {
  const [text, setText] = useState(initialText);
  const [units, setUnits] = useUnitSystem();
  const [active, setActive] = useState<SidewallPartKey | null>(null);
  const [today] = useState(() => new Date());
  const [parser, loadParser] = useOnDemand(fetchParser);
  const reading = useMemo(
    () => (parser ? { text, result: parser.parseMarking(text, { today }) } : { text: initialText, result: initialResult }),
    [parser, text, today, initialText, initialResult],
  );
  const result = reading.result;
  const marking = result.ok ? result : null;
  const parts = useMemo(() => (marking ? describeMarking(marking, units) : []), [marking, units]);
  const activeDimension = parts.find((part) => part.key === active)?.dimension ?? null;

  useEffect(() => {
    const timer = window.setTimeout(() => {
      const url = new URL(window.location.href);
      if (text.trim()) url.searchParams.set("q", text);
      else url.searchParams.delete("q");
      window.history.replaceState(window.history.state, "", url);
    }, 300);
    return () => window.clearTimeout(timer);
  }, [text]);

  return (
    <div className="grid gap-6 [grid-template-areas:'input'_'drawing'_'parts'_'next'] lg:grid-cols-[minmax(0,1fr)_minmax(0,1.05fr)] lg:grid-rows-[auto_auto_1fr] lg:gap-x-10 lg:[grid-template-areas:'input_drawing'_'parts_drawing'_'parts_next']">
      <div className="flex min-w-0 flex-col gap-4 [grid-area:input]" onFocus={loadParser}>
        <MarkingInput
          value={text}
          onChange={(next) => {
            loadParser();
            setText(next);
          }}
        />
        {reading.text.trim() ? <MarkedEcho input={reading.text} parts={parts} active={active} /> : null}
        <ReaderStatus text={reading.text} result={result} />
        <div className="flex justify-end">
          <UnitsToggle units={units} onChange={setUnits} />
        </div>
      </div>
      {marking?.size && marking.geometry ? (
        <div className="min-w-0 [grid-area:drawing]">
          <ReaderFigure size={marking.size} geometry={marking.geometry} units={units} highlight={activeDimension} />
        </div>
      ) : null}
      {parts.length > 0 ? (
        <section aria-labelledby="parts-heading" className="min-w-0 [grid-area:parts]">
          <h2 id="parts-heading" className="mb-2 font-semibold">
            What each part means
          </h2>
          <PartList parts={parts} size={marking?.size ?? null} active={active} onActivate={setActive} />
        </section>
      ) : null}
      {marking ? (
        <div className="min-w-0 [grid-area:next]">
          <NextSteps marking={marking} />
        </div>
      ) : null}
    </div>
  );
}
