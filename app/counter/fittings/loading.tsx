/** Shown while the fittings are read; access and the address are settled before it streams. */
export default function FittingsLoading() {
  return (
    <section aria-busy="true" aria-live="polite">
      <p className="font-mono text-xs tracking-widest text-accent uppercase">Counter · Fittings</p>
      <h1 className="mt-1 text-3xl font-semibold tracking-tight sm:text-4xl">Fittings</h1>
      <p className="mt-3 text-lg text-ink-soft">Reading the fittings…</p>
      <div className="mt-6 grid gap-4 md:grid-cols-2" aria-hidden="true">
        {Array.from({ length: 2 }, (_, index) => (
          <div key={index} className="h-40 animate-pulse rounded border border-rule bg-sheet" />
        ))}
      </div>
    </section>
  );
}
