import { notEqualOrBetterCaution } from "@/content/safety";
import type { TireVerdict } from "@/lib/fit-cards/tire-verdict";
import { RuleNotes } from "./rule-notes";

/**
 * A tire against the one on the car, by the rules of equal-or-better: why it qualifies, or what it
 * does not meet with the caution to check the placard, and what else the driver should know.
 */
export function TireVerdictList({ verdict }: { verdict: Pick<TireVerdict, "equalOrBetter" | "reasons" | "notes"> }) {
  const { equalOrBetter, reasons, notes } = verdict;
  return (
    <div className="mt-2 text-sm">
      <p className="font-semibold">{equalOrBetter ? "Equal or better than the tire on the car:" : "Differs from the tire on the car:"}</p>
      <ul className={equalOrBetter ? "" : "text-danger"}>
        {reasons.map((reason) => (
          <li key={reason} className="flex gap-1.5">
            <span aria-hidden="true">{equalOrBetter ? "✓" : "!"}</span>
            {reason}
          </li>
        ))}
      </ul>
      {equalOrBetter ? null : <p className="mt-1 font-semibold">{notEqualOrBetterCaution}</p>}
      {notes.length > 0 ? <RuleNotes notes={notes} /> : null}
    </div>
  );
}
