import type { ReactNode } from "react";

export const fieldClass = "min-h-11 w-full rounded border border-rule bg-sheet px-3 text-base aria-invalid:border-danger";

/** What a field hands its control so that the label, the hint and the error are read out with it. */
export interface FieldControl {
  id: string;
  "aria-invalid"?: true;
  "aria-describedby"?: string;
}

interface FormFieldProps {
  id: string;
  label: ReactNode;
  /** Read out with the control: a plain hint, or live content such as what a size reads as. */
  hint?: ReactNode;
  /** When the hint is an element with its own id (a live region), that id; otherwise the field wraps the hint. */
  hintId?: string;
  error?: string;
  children: (control: FieldControl) => ReactNode;
}

/** The one labelled form field: a label, its control, a hint and the field's error, tied together by ids. */
export function FormField({ id, label, hint, hintId: ownHintId, error, children }: FormFieldProps) {
  const hintId = hint ? (ownHintId ?? `${id}-hint`) : null;
  const errorId = error ? `${id}-error` : null;
  const describedBy = [errorId, hintId].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {children({ id, "aria-invalid": error ? true : undefined, "aria-describedby": describedBy })}
      {hint && ownHintId ? hint : null}
      {hint && !ownHintId ? (
        <div id={hintId ?? undefined} className="text-sm text-ink-soft">
          {hint}
        </div>
      ) : null}
      {error ? (
        <p id={errorId ?? undefined} className="text-sm text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
