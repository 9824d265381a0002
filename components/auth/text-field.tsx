import type { InputHTMLAttributes } from "react";

/** A labelled input with its error read out with it. */
export function TextField({ label, name, error, ...input }: { label: string; name: string; error?: string } & InputHTMLAttributes<HTMLInputElement>) {
  const errorId = `${name}-error`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={name} className="font-semibold">
        {label}
      </label>
      <input
        id={name}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        className="min-h-11 rounded border border-rule bg-sheet px-3 text-base aria-invalid:border-danger"
        {...input}
      />
      {error ? (
        <p id={errorId} className="text-sm text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
