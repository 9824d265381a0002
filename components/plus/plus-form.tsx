const field = "min-h-11 w-full rounded border border-ink/60 bg-sheet px-3 font-mono text-ink focus:border-accent focus:outline-none";

export interface PlusFormValues {
  size?: string;
  loadIndex?: number;
  speedSymbol?: string;
  tolerancePct?: number;
}

/** The planner's question, as a plain GET form: the answer is a page with its own address. */
export function PlusForm({ values, defaultTolerancePct }: { values: PlusFormValues; defaultTolerancePct: number }) {
  const tolerance = values.tolerancePct ?? defaultTolerancePct;
  return (
    <form action="/plus" method="get" className="grid gap-3 rounded border border-rule bg-sheet p-4 sm:grid-cols-[2fr_1fr_1fr_1fr_auto] sm:items-end">
      <label className="flex flex-col gap-1 text-sm">
        Current size
        <input name="size" required defaultValue={values.size ?? ""} placeholder="225/45R17" autoCapitalize="characters" autoComplete="off" spellCheck={false} className={field} />
      </label>
      <label className="flex flex-col gap-1 text-sm">
        Load index <span className="text-xs text-ink-soft">(optional)</span>
        <input name="loadIndex" inputMode="numeric" pattern="[0-9]{1,3}" defaultValue={values.loadIndex ?? ""} placeholder="94" className={field} />
      </label>
      <label className="flex flex-col gap-1 text-sm">
        Speed symbol <span className="text-xs text-ink-soft">(optional)</span>
        <input name="speedSymbol" defaultValue={values.speedSymbol ?? ""} placeholder="W" autoCapitalize="characters" autoComplete="off" className={field} />
      </label>
      <label className="flex flex-col gap-1 text-sm">
        Tolerance
        <select name="tolerancePct" defaultValue={String(tolerance)} className={field}>
          {[1, 1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5].map((pct) => (
            <option key={pct} value={pct}>
              ± {pct} %
            </option>
          ))}
        </select>
      </label>
      <button type="submit" className="min-h-11 rounded bg-accent px-4 font-semibold text-sheet hover:opacity-90">
        Plan
      </button>
    </form>
  );
}
