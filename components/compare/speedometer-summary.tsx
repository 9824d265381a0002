import { useId } from "react";
import { type ComparedSize } from "@/lib/tire/compare";
import { type UnitSystem } from "@/lib/tire/display";
import { speedometerSentence } from "@/lib/tire/speedometer-words";

/** The speedometer's effect in one plain sentence per compared size, at 100 km/h or 65 mph. */
export function SpeedometerSummary({ sizes, units }: { sizes: ComparedSize[]; units: UnitSystem }) {
  const headingId = useId();
  const [reference, ...others] = sizes;
  if (!reference || others.length === 0) return null;
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-2">
      <h2 id={headingId} className="text-xs tracking-wide text-ink-soft uppercase">
        The speedometer, set for {reference.designation}
      </h2>
      <ul className="flex flex-col gap-2">
        {others.map((size, index) => {
          const sentence = speedometerSentence(reference.overallDiameterMm, size, units);
          return (
            <li
              key={`${size.designation}-${index}`}
              data-verdict={sentence.verdict}
              className={`border-l-4 py-0.5 pl-3 ${sentence.breaksRule ? "border-danger font-semibold text-danger" : "border-rule"}`}
            >
              {sentence.text}
            </li>
          );
        })}
      </ul>
      <p className="text-sm text-ink-soft">
        This takes the speedometer to read true on {reference.designation}; most read a little high from new (common practice). After a change of size, have a
        qualified fitter check the speedometer, and keep to the sizes on the vehicle&apos;s placard or approved by its maker.
      </p>
    </section>
  );
}
