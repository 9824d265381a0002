"use client";

import { useEffect, useState } from "react";
import { FormField } from "@/components/ui/form-field";
import { formatDateTime } from "@/lib/format/format";
import { itemInputClass, useHydrated } from "./item-controls";

/** What the clock reads now in a zone, or null for a name this browser cannot use. */
function nowIn(timeZone: string, now: Date): string | null {
  try {
    return formatDateTime(now, { timeZone });
  } catch {
    return null;
  }
}

/** A minute's tick, started after hydration, so the server's HTML never disagrees with the browser's clock. */
function useNow(): Date | null {
  const hydrated = useHydrated();
  const [now, setNow] = useState<Date | null>(null);
  useEffect(() => {
    if (!hydrated) return;
    const tick = () => setNow(new Date());
    const first = setTimeout(tick, 0);
    const every = setInterval(tick, 30_000);
    return () => {
      clearTimeout(first);
      clearInterval(every);
    };
  }, [hydrated]);
  return now;
}

/** The time zone, typed or picked from the IANA names the server knows, with the local time there as a check. */
export function ShopTimeZoneField({ value, zones, error, onChange }: { value: string; zones: readonly string[]; error?: string; onChange: (zone: string) => void }) {
  const now = useNow();
  const zone = value.trim();
  const reading = now && zone ? nowIn(zone, now) : null;
  const hint = !now ? "Type to search the IANA names, e.g. New_York or Honolulu." : reading ? `Now there: ${reading}.` : "Not a time zone this browser knows: pick one from the list.";
  return (
    <FormField id="shop-timeZone" label="Time zone" error={error} hint={<span aria-live="polite">{hint}</span>}>
      {(control) => (
        <>
          <input {...control} name="timeZone" list="shop-time-zones" value={value} onChange={(event) => onChange(event.target.value)} autoComplete="off" spellCheck={false} className={`${itemInputClass} font-mono`} />
          <datalist id="shop-time-zones">
            {zones.map((name) => (
              <option key={name} value={name} />
            ))}
          </datalist>
        </>
      )}
    </FormField>
  );
}
