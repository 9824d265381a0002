import { formatDateTime } from "@/lib/format/format";
import type { FreeSlot } from "./slot-days";

/** The next free times the shop suggests when the one chosen was taken meanwhile. */
export function SuggestedSlots({ slots, chosen, timeZone, onChoose }: { slots: FreeSlot[]; chosen: string | null; timeZone: string; onChoose: (slot: FreeSlot) => void }) {
  return (
    <fieldset className="rounded border border-rule p-3">
      <legend className="px-1 font-semibold">The next free times</legend>
      <div className="flex flex-col gap-1">
        {slots.map((slot) => (
          <label key={slot.start} className="flex min-h-11 cursor-pointer items-center gap-2 text-sm">
            <input type="radio" name="suggested-time" value={slot.start} checked={slot.start === chosen} onChange={() => onChoose(slot)} className="size-4 accent-accent" />
            {formatDateTime(slot.start, { timeZone })}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
