import { tireLineStyles } from "@/components/diagram/drawing-layout";

/** A short stroke in the size's line style, so the drawing can be read without colour. */
export function LineSample({ index }: { index: number }) {
  const dash = tireLineStyles[index % tireLineStyles.length] ?? "none";
  return (
    <svg width="36" height="10" aria-hidden="true" className="shrink-0 text-ink">
      <line x1="0" y1="5" x2="36" y2="5" stroke="currentColor" strokeWidth="2.5" strokeDasharray={dash === "none" ? undefined : dash.split(" ").map((n) => Number(n) / 3).join(" ")} />
    </svg>
  );
}
