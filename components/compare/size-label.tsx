import { LineSample } from "./line-sample";

/** A compared size as the tables name it: its line style, its designation and, for the first, that it is the reference. */
export function SizeLabel({ designation, index }: { designation: string; index: number }) {
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <LineSample index={index} />
      <span className="font-mono font-semibold whitespace-nowrap">{designation}</span>
      {index === 0 ? <span className="text-xs font-normal text-ink-soft">reference</span> : null}
    </span>
  );
}

/** The same, on one line, for a size's own block on a narrow screen. */
export function SizeHeading({ designation, index }: { designation: string; index: number }) {
  return (
    <h3 className="flex flex-wrap items-center gap-x-2 border-b border-rule pb-1">
      <LineSample index={index} />
      <span className="font-mono font-semibold">{designation}</span>
      {index === 0 ? <span className="text-sm text-ink-soft">reference</span> : null}
    </h3>
  );
}
