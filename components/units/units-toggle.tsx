"use client";

import type { UnitSystem } from "@/lib/tire/display";

const choices: { value: UnitSystem; label: string }[] = [
  { value: "metric", label: "Metric" },
  { value: "imperial", label: "Imperial" },
];

export function UnitsToggle({ units, onChange }: { units: UnitSystem; onChange: (units: UnitSystem) => void }) {
  return (
    <fieldset className="inline-flex items-center gap-2 text-sm">
      <legend className="sr-only">Units</legend>
      <span aria-hidden="true" className="text-ink-soft">
        Units
      </span>
      <span className="inline-flex rounded border border-rule bg-sheet p-0.5">
        {choices.map((choice) => (
          <label
            key={choice.value}
            className={`inline-flex min-h-10 cursor-pointer items-center rounded px-3 has-focus-visible:outline-2 has-focus-visible:outline-accent ${
              units === choice.value ? "bg-accent font-semibold text-sheet" : "text-ink-soft hover:text-ink"
            }`}
          >
            <input
              type="radio"
              name="units"
              value={choice.value}
              checked={units === choice.value}
              onChange={() => onChange(choice.value)}
              className="sr-only"
            />
            {choice.label}
          </label>
        ))}
      </span>
    </fieldset>
  );
}
