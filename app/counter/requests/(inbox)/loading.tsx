/** Shown while the requests are read; access and the address are settled before it streams. */
export default function RequestsLoading() {
  return (
    <section aria-busy="true" aria-live="polite">
      <p className="font-mono text-xs tracking-widest text-accent uppercase">Counter · Staff</p>
      <h1 className="mt-1 text-3xl font-semibold tracking-tight sm:text-4xl">Price requests</h1>
      <p className="mt-3 text-lg text-ink-soft">Reading the requests…</p>
      <div className="mt-6 flex flex-col gap-2" aria-hidden="true">
        {Array.from({ length: 4 }, (_, index) => (
          <div key={index} className="h-20 animate-pulse rounded border border-rule bg-sheet" />
        ))}
      </div>
    </section>
  );
}
