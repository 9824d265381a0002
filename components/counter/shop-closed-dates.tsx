"use client";

import { useState } from "react";
import { formatDay } from "@/lib/format/format";
import { closedDateProblem, MAX_CLOSED_DATES } from "@/lib/shop/week-rules";
import { itemInputClass } from "./item-controls";

// A YYYY-MM-DD date is a day, not an instant: read and written at UTC midnight, it stays that day.
const dayWords = (date: string) => formatDay(`${date}T00:00:00Z`, { timeZone: "UTC", long: true });

/** Holidays and other days the shop is closed: added with a date input, kept in order, each removable. */
export function ShopClosedDates({ dates, error, onChange }: { dates: string[]; error?: string; onChange: (dates: string[]) => void }) {
  const [draft, setDraft] = useState("");
  const [draftError, setDraftError] = useState<string | null>(null);
  const shownError = draftError ?? error;

  function add() {
    const date = draft.trim();
    const problem = date === "" ? "Choose a date first." : closedDateProblem(date);
    if (problem) return setDraftError(problem.endsWith(".") ? problem : `${problem.charAt(0).toUpperCase()}${problem.slice(1)}.`);
    if (dates.includes(date)) return setDraftError(`${dayWords(date)} is already in the list.`);
    if (dates.length >= MAX_CLOSED_DATES) return setDraftError(`At most ${MAX_CLOSED_DATES} closed dates: remove past ones first.`);
    setDraftError(null);
    setDraft("");
    onChange([...dates, date].sort());
  }

  return (
    <div className="flex flex-col gap-3">
      {dates.length === 0 ? (
        <p className="text-ink-soft">No closed dates: the weekly hours apply every week.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-rule rounded border border-rule">
          {dates.map((date) => (
            <li key={date} className="flex flex-wrap items-center justify-between gap-2 px-3 py-1">
              <span>
                {dayWords(date)} <span className="font-mono text-sm text-ink-soft">{date}</span>
              </span>
              <button type="button" onClick={() => onChange(dates.filter((other) => other !== date))} className="inline-flex min-h-11 items-center px-1 font-semibold text-accent underline underline-offset-4">
                Remove<span className="sr-only"> {dayWords(date)}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
      <div className="flex flex-wrap items-end gap-2">
        <div className="flex flex-col gap-1">
          <label htmlFor="closed-date-new" className="font-semibold">
            Add a closed date
          </label>
          <input
            id="closed-date-new"
            type="date"
            value={draft}
            min="2000-01-01"
            max="2099-12-31"
            onChange={(event) => setDraft(event.target.value)}
            onKeyDown={(event) => {
              if (event.key === "Enter") {
                event.preventDefault();
                add();
              }
            }}
            aria-invalid={shownError ? true : undefined}
            aria-describedby={shownError ? "closed-dates-error" : undefined}
            className={itemInputClass}
          />
        </div>
        <button type="button" onClick={add} className="inline-flex min-h-11 items-center rounded border border-accent px-3 font-semibold text-accent hover:bg-accent-soft">
          Add date
        </button>
      </div>
      {shownError ? (
        <p id="closed-dates-error" className="text-sm text-danger">
          {shownError}
        </p>
      ) : null}
    </div>
  );
}
