/**
 * A labelled progress bar with its figures in words beside it, read out politely as they change.
 * A null value shows a bar without a figure, for work whose length is unknown.
 */
export function ImportProgress({ id, label, value, text }: { id: string; label: string; value: number | null; text: string }) {
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <progress
        id={id}
        max={1}
        value={value ?? undefined}
        className={`h-3 w-full overflow-hidden rounded-full bg-accent-soft accent-accent [&::-moz-progress-bar]:bg-accent [&::-webkit-progress-bar]:bg-accent-soft [&::-webkit-progress-value]:bg-accent ${
          value === null ? "animate-pulse [&::-webkit-progress-bar]:bg-accent" : ""
        }`}
      />
      <p role="status" aria-live="polite" className="font-mono text-sm text-ink-soft">
        {text}
      </p>
    </div>
  );
}
