import { useSyncExternalStore, type ReactNode } from "react";

const noSubscription = () => () => {};

/** False in the server's HTML and until the page is hydrated: controls that only work with JavaScript wait for it. */
export function useHydrated(): boolean {
  return useSyncExternalStore(noSubscription, () => true, () => false);
}

export const itemInputClass = "min-h-11 w-full rounded border border-rule bg-paper px-3 text-base aria-invalid:border-danger";

interface ItemFieldProps {
  name: string;
  label: string;
  error?: string;
  /** The id of a hint read out with the field (a decoded size, a unit). */
  hintId?: string;
  hint?: ReactNode;
  children: (control: { id: string; "aria-invalid"?: true; "aria-describedby"?: string }) => ReactNode;
}

/** A labelled form control with its hint and its error, both read out with it. */
export function ItemField({ name, label, error, hintId, hint, children }: ItemFieldProps) {
  const id = `item-${name}`;
  const errorId = `${id}-error`;
  const describedBy = [error ? errorId : null, hintId ?? null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {children({ id, "aria-invalid": error ? true : undefined, "aria-describedby": describedBy })}
      {hint}
      {error ? (
        <p id={errorId} className="text-sm text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
