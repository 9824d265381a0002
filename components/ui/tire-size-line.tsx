import type { Tire } from "@/lib/catalog/catalog-tire";
import { formatServiceDescription, formatSignedPercent } from "@/lib/tire";

type SizedTire = Pick<Tire, "designation" | "loadIndex" | "loadIndexDual" | "speedSymbol" | "extraLoad" | "loadRange">;

/** A tire's size with its load index and speed symbol, XL or load range, and how its diameter differs from the original's. */
export function TireSizeLine({ tire, diameterDiffPct }: { tire: SizedTire; diameterDiffPct?: number }) {
  return (
    <p className="font-mono text-sm">
      {tire.designation} {formatServiceDescription(tire)}
      {tire.extraLoad ? " XL" : ""}
      {tire.loadRange ? ` LR ${tire.loadRange}` : ""}
      {diameterDiffPct === undefined ? null : <span className="ml-2 text-ink-soft">({formatSignedPercent(diameterDiffPct)} diameter)</span>}
    </p>
  );
}
