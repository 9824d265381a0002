import type { ReactNode } from "react";

export const fieldClass = "min-h-11 w-full rounded border border-rule bg-sheet px-3 text-base aria-invalid:border-danger";

/** A label, its control, a hint and the field's error, tied together for screen readers by the ids. */
export function FormField({ id, label, hint, error, children }: { id: string; label: string; hint?: string; error?: string; children: ReactNode }) {
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {children}
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} className="text-sm text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** The aria attributes a control needs so that its hint and its error are read out with it. */
export function describedBy(id: string, { hint, error }: { hint?: boolean; error?: string }) {
  const ids = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ");
  return { "aria-invalid": error ? true : undefined, "aria-describedby": ids || undefined } as const;
}
