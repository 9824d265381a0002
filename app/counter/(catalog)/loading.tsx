/** Shown while the catalog page reads the database; its status is settled before it streams. */
export default function CatalogLoading() {
  return (
    <section aria-busy="true" aria-live="polite">
      <p className="font-mono text-xs tracking-widest text-accent uppercase">Staff</p>
      <h1 className="mt-1 text-3xl font-semibold tracking-tight sm:text-4xl">Counter: the catalog</h1>
      <p className="mt-3 text-lg text-ink-soft">Reading the catalog…</p>
      <div className="mt-6 flex flex-col gap-2" aria-hidden="true">
        {Array.from({ length: 6 }, (_, index) => (
          <div key={index} className="h-11 animate-pulse rounded border border-rule bg-sheet" />
        ))}
      </div>
    </section>
  );
}
