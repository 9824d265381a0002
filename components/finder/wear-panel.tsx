"use client";

import Link from "next/link";
import { useId, useState } from "react";
import { wearMatchCautions } from "@/content/safety";
import type { FinderQuery } from "@/lib/finder/finder-query";
import { COUNT_PROBLEM, type FinderWear, WEAR_SORT } from "@/lib/finder/finder-wear";
import { HALF_32NDS_PATTERN, WEAR_LIMIT_32_MAX } from "@/lib/wear-match/wear-match-rules";

interface WearPanelProps {
  query: FinderQuery;
  wear: FinderWear;
  /** The original's slug, for Wear match's own page. */
  sizeSlug: string;
  onChange: (patch: Partial<FinderQuery>) => void;
}

const input = "min-h-11 w-full rounded border border-rule bg-sheet px-3 font-mono text-ink aria-invalid:border-danger";
const LIMIT_RULE = `Give the limit in 32nds of an inch from 0.5 to ${WEAR_LIMIT_32_MAX}, whole or a half, or leave it empty for the shop's.`;

const readLimit = (text: string): number | null | undefined => {
  const trimmed = text.trim();
  if (trimmed === "") return undefined;
  const limit = Number(trimmed);
  return HALF_32NDS_PATTERN.test(trimmed) && limit >= 0.5 && limit <= WEAR_LIMIT_32_MAX ? limit : null;
};

/**
 * Replacing one or two tires on an all-wheel-drive vehicle: the depths left on the tires that stay,
 * which every result is then judged against. Everything typed lives in the address.
 */
export function WearPanel({ query, wear, sizeSlug, onChange }: WearPanelProps) {
  const id = useId();
  const [limitError, setLimitError] = useState(false);
  const toggle = (on: boolean) =>
    onChange(
      on
        ? { awd: "1", quantity: (query.quantity ?? 4) > 2 ? 2 : query.quantity }
        : { awd: undefined, remaining32: undefined, wearLimit32: undefined, sort: query.sort === WEAR_SORT ? undefined : query.sort },
    );
  const typeDepth = (index: number, text: string) => {
    if (!wear.on) return;
    const typed = wear.typed.map((depth, at) => (at === index ? text.replaceAll(",", "") : depth));
    onChange({ remaining32: typed.some((depth) => depth.trim() !== "") ? typed.join(",") : undefined });
  };
  const anyTyped = wear.on && wear.typed.some((depth) => depth.trim() !== "");
  const badDepth = (text: string) => text.trim() !== "" && !HALF_32NDS_PATTERN.test(text.trim());
  const showProblem = wear.on && wear.problem !== null && (wear.problem === COUNT_PROBLEM || anyTyped);
  const wearMatchHref = `/wear-match?size=${sizeSlug}${wear.on && wear.staying ? `&remaining32=${wear.staying.remaining32.join(",")}` : ""}`;
  return (
    <section aria-label="Tread depth on an all-wheel-drive vehicle" className="rounded border border-rule bg-sheet p-4 text-sm">
      <label className="flex min-h-11 items-center gap-2 font-semibold">
        <input type="checkbox" checked={wear.on} onChange={(event) => toggle(event.target.checked)} className="size-5 shrink-0 accent-[var(--color-accent)]" />
        Replacing fewer than four on an all-wheel-drive vehicle
      </label>
      {wear.on ? (
        <div className="mt-2 flex flex-col gap-3">
          <p className="text-ink-soft">
            New tires beside worn ones turn a different number of times a mile, and the drivetrain feels it. Measure each tire that stays in several
            grooves and give the lowest reading; each result below then says whether it fits as it is, needs shaving, or means a new set.
          </p>
          {wear.stayingCount >= 2 ? (
            <fieldset className="grid grid-cols-3 gap-3">
              <legend className="mb-1 font-semibold">Depth left on the tires that stay (32nds of an inch)</legend>
              {wear.typed.map((depth, index) => (
                <label key={index} className="flex flex-col gap-1">
                  Tire {index + 1}
                  <input
                    className={input}
                    inputMode="decimal"
                    autoComplete="off"
                    placeholder="6.5"
                    value={depth}
                    aria-invalid={badDepth(depth) || undefined}
                    aria-describedby={showProblem ? `${id}-problem` : undefined}
                    onChange={(event) => typeDepth(index, event.target.value)}
                  />
                </label>
              ))}
            </fieldset>
          ) : null}
          <label className="flex flex-col gap-1 sm:max-w-xs">
            Vehicle maker&apos;s limit (32nds of an inch)
            <input
              className={input}
              inputMode="decimal"
              autoComplete="off"
              placeholder={`${wear.on ? wear.limit32 : ""} (the shop's)`}
              defaultValue={query.wearLimit32 ?? ""}
              aria-invalid={limitError || undefined}
              aria-describedby={limitError ? `${id}-limit-error` : undefined}
              onBlur={(event) => {
                const limit = readLimit(event.target.value);
                setLimitError(limit === null);
                if (limit !== null) onChange({ wearLimit32: limit });
              }}
            />
          </label>
          {limitError ? (
            <p id={`${id}-limit-error`} className="font-semibold text-danger">
              {LIMIT_RULE}
            </p>
          ) : null}
          <p id={`${id}-problem`} aria-live="polite" className={showProblem ? "font-semibold text-danger" : "text-ink-soft"}>
            {showProblem ? wear.problem : wear.staying ? `Judged against a limit of ${wear.limit32}/32 in between any two tires on the vehicle.` : "Type the depths to see each tire's verdict."}
          </p>
          <p>
            Limit given as a rolling circumference, or a tire not listed here?{" "}
            <Link href={wearMatchHref} className="font-semibold text-accent underline underline-offset-4">
              Open Wear match
            </Link>
          </p>
          <ul className="list-disc space-y-1 border-l-4 border-caution bg-caution-soft py-2 pr-2 pl-7">
            {wearMatchCautions.map((caution) => (
              <li key={caution}>{caution}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
