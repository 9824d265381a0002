"use client";

import { WEEKDAYS, type Weekday } from "@/lib/tire";
import { MAX_INTERVALS_PER_DAY } from "@/lib/shop/week-rules";
import { itemInputClass } from "./item-controls";

const DAY_NAMES: Record<Weekday, string> = { mon: "Monday", tue: "Tuesday", wed: "Wednesday", thu: "Thursday", fri: "Friday", sat: "Saturday", sun: "Sunday" };

type Week = Record<Weekday, [string, string][]>;

const smallButton = "inline-flex min-h-11 items-center rounded border border-accent px-3 font-semibold text-accent hover:bg-accent-soft";

/**
 * The week's opening hours: each day closed, or one or more intervals (a lunch break is a second
 * interval). Times are typed as HH:MM on a 24-hour clock, so a day may run to 24:00.
 */
export function ShopHoursEditor({ hours, errors, onChange }: { hours: Week; errors: Partial<Record<string, string>>; onChange: (hours: Week) => void }) {
  const setDay = (day: Weekday, intervals: [string, string][]) => onChange({ ...hours, [day]: intervals });
  return (
    <div className="flex flex-col divide-y divide-rule">
      {WEEKDAYS.map((day) => {
        const intervals = hours[day];
        const error = errors[`hours.${day}`];
        const errorId = `hours-${day}-error`;
        return (
          <fieldset key={day} aria-describedby={error ? errorId : undefined} className="grid gap-2 py-3 sm:grid-cols-[8rem_1fr]">
            <legend className="float-left font-semibold sm:pt-2">{DAY_NAMES[day]}</legend>
            <div className="flex flex-col gap-2 sm:col-start-2">
              {intervals.length === 0 ? <p className="text-ink-soft">Closed</p> : null}
              {intervals.map(([from, to], index) => {
                const which = `${DAY_NAMES[day]} interval ${index + 1}`;
                const set = (end: 0 | 1, value: string) =>
                  setDay(day, intervals.map((interval, at) => (at === index ? ((end === 0 ? [value, interval[1]] : [interval[0], value]) as [string, string]) : interval)));
                return (
                  <div key={index} className="flex flex-wrap items-end gap-2">
                    {([["from", "Opens", from], ["to", "Closes", to]] as const).map(([name, label, value], end) => (
                      <label key={name} className="flex w-24 flex-col gap-1 text-sm font-semibold">
                        <span>
                          <span className="sr-only">{which} </span>
                          {label}
                        </span>
                        <input
                          value={value}
                          onChange={(event) => set(end as 0 | 1, event.target.value)}
                          inputMode="numeric"
                          autoComplete="off"
                          placeholder="HH:MM"
                          maxLength={5}
                          aria-invalid={error ? true : undefined}
                          className={`${itemInputClass} font-mono`}
                        />
                      </label>
                    ))}
                    <button type="button" onClick={() => setDay(day, intervals.filter((_, at) => at !== index))} className={smallButton}>
                      Remove<span className="sr-only"> {which}</span>
                    </button>
                  </div>
                );
              })}
              <div className="flex flex-wrap gap-2">
                {intervals.length === 0 ? (
                  <button type="button" onClick={() => setDay(day, [["08:00", "17:00"]])} className={smallButton}>
                    Open on {DAY_NAMES[day]}
                  </button>
                ) : intervals.length < MAX_INTERVALS_PER_DAY ? (
                  <button type="button" onClick={() => setDay(day, [...intervals, ["", ""]])} className={smallButton}>
                    Add hours after a break<span className="sr-only"> on {DAY_NAMES[day]}</span>
                  </button>
                ) : null}
              </div>
              {error ? (
                <p id={errorId} className="text-sm text-danger">
                  {error}
                </p>
              ) : null}
            </div>
          </fieldset>
        );
      })}
    </div>
  );
}
