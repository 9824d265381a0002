import { formatCalendarDate, formatTime } from "@/lib/format/format";
import type { FreeSlot, SlotDay } from "./slot-days";

const optionClass =
  "flex min-h-11 cursor-pointer items-center gap-2 rounded border border-rule bg-sheet px-3 text-sm has-checked:border-accent has-checked:bg-accent-soft has-checked:font-semibold";

interface SlotPickerProps {
  days: SlotDay[];
  day: SlotDay;
  chosen: string | null;
  timeZone: string;
  onDay: (date: string) => void;
  onChoose: (slot: FreeSlot) => void;
}

/** Two radio groups: the day, then a free time that day (arrow keys move within each). */
export function SlotPicker({ days, day, chosen, timeZone, onDay, onChoose }: SlotPickerProps) {
  return (
    <div className="flex flex-col gap-4">
      <fieldset>
        <legend className="font-semibold">Day</legend>
        <div className="mt-2 grid grid-cols-[repeat(auto-fill,minmax(9rem,1fr))] gap-2">
          {days.map(({ date, slots }) => (
            <label key={date} className={optionClass}>
              <input type="radio" name="fitting-day" value={date} checked={date === day.date} onChange={() => onDay(date)} className="size-4 accent-accent" />
              <span>
                <span className="whitespace-nowrap">{formatCalendarDate(date, "short")}</span>
                <span className="block text-xs font-normal text-ink-soft">{slots.length} free</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <fieldset>
        <legend className="font-semibold">Time on {formatCalendarDate(day.date, "full")}</legend>
        <div className="mt-2 grid grid-cols-[repeat(auto-fill,minmax(6.5rem,1fr))] gap-2">
          {day.slots.map((slot) => (
            <label key={slot.start} className={optionClass}>
              <input type="radio" name="fitting-time" value={slot.start} checked={slot.start === chosen} onChange={() => onChoose(slot)} className="size-4 accent-accent" />
              <span className="whitespace-nowrap">{formatTime(slot.start, { timeZone })}</span>
            </label>
          ))}
        </div>
      </fieldset>
    </div>
  );
}
