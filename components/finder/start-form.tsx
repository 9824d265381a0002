import Link from "next/link";
import { SEASONS } from "@/lib/tire";
import type { FinderQuery } from "@/lib/finder/finder-query";

const field = "min-h-11 w-full rounded border border-ink/60 bg-sheet px-3 font-mono text-ink focus:border-accent focus:outline-none";

/**
 * What is on the car now. A plain GET form, so it works before any script has loaded; the finder
 * below takes everything else from the address it lands on.
 */
export function StartForm({ query, open }: { query: FinderQuery; open: boolean }) {
  return (
    <details open={open} className="rounded border border-rule bg-sheet p-4">
      <summary className="cursor-pointer font-semibold">{open ? "Your current tire" : "Change the current tire"}</summary>
      <form action="/replace" method="get" className="mt-3 grid gap-3 sm:grid-cols-[2fr_1fr_1fr_1fr] sm:items-end">
        <label className="flex flex-col gap-1 text-sm">
          Size
          <input name="size" required defaultValue={query.size ?? ""} placeholder="285/50R20" autoCapitalize="characters" autoComplete="off" spellCheck={false} className={field} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          Load index
          <input name="loadIndex" required inputMode="numeric" pattern="[0-9]{1,3}" defaultValue={query.loadIndex ?? ""} placeholder="119" className={field} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          Speed symbol
          <input name="speedSymbol" required defaultValue={query.speedSymbol ?? ""} placeholder="S" autoCapitalize="characters" autoComplete="off" className={field} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          Load range <span className="text-xs text-ink-soft">(LT tires)</span>
          <input name="loadRange" defaultValue={query.loadRange ?? ""} placeholder="E" autoCapitalize="characters" autoComplete="off" className={field} />
        </label>
        <label className="flex flex-col gap-1 text-sm">
          Dual index <span className="text-xs text-ink-soft">(if marked, as 120 in 123/120R)</span>
          <input name="loadIndexDual" inputMode="numeric" pattern="[0-9]{1,3}" defaultValue={query.loadIndexDual ?? ""} placeholder="120" className={field} />
        </label>
        <label className="flex flex-col gap-1 text-sm sm:col-span-2">
          Kind of tire on the car now <span className="text-xs text-ink-soft">(optional)</span>
          <select name="originalSeason" defaultValue={query.originalSeason ?? ""} className={field}>
            <option value="">Not sure</option>
            {SEASONS.map((season) => (
              <option key={season} value={season}>
                {season}
              </option>
            ))}
          </select>
        </label>
        <button type="submit" className="min-h-11 self-end rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90">
          Find tires
        </button>
      </form>
      <p className="mt-2 text-sm text-ink-soft">
        The size, load index and speed symbol are printed together on the sidewall, like 285/50R20 119S.
        Not sure? <Link href="/" className="text-accent underline underline-offset-4">Read your sidewall first</Link>.
      </p>
    </details>
  );
}
