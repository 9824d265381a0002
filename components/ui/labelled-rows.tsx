import type { ReactNode } from "react";

/** "Label: value" rows as a description list: label above value on a phone, beside it from `sm` up. */
export function LabelledRows({ rows, className = "" }: { rows: readonly (readonly [string, ReactNode])[]; className?: string }) {
  return (
    <dl className={`grid gap-x-6 ${className}`}>
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-semibold text-ink-soft">{label}</dt>
          <dd className="mb-2 break-words whitespace-pre-line sm:mb-0">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
