import type { ImportMode } from "@/lib/catalog-csv/import-report";

const choices: { mode: ImportMode; label: string; detail: string }[] = [
  { mode: "all-or-nothing", label: "All or nothing (recommended)", detail: "If any row is refused, nothing is written." },
  { mode: "valid-rows", label: "Import the valid rows only", detail: "Refused rows are skipped and listed in the report; the rest are written." },
];

/** The two ways to import, spelled out, so nobody writes half a file by accident. */
export function ImportModeChoice({ mode, disabled, onChange }: { mode: ImportMode; disabled: boolean; onChange: (mode: ImportMode) => void }) {
  return (
    <fieldset disabled={disabled} className="flex flex-col gap-2">
      <legend className="mb-2 font-semibold">When some rows are refused</legend>
      {choices.map((choice) => (
        <label key={choice.mode} className="flex min-h-11 cursor-pointer items-start gap-3 rounded border border-rule bg-sheet p-3 has-checked:border-accent has-checked:bg-accent-soft">
          <input
            type="radio"
            name="import-mode"
            value={choice.mode}
            checked={mode === choice.mode}
            onChange={() => onChange(choice.mode)}
            className="mt-1 size-5 shrink-0 accent-accent"
          />
          <span>
            <span className="block font-semibold">{choice.label}</span>
            <span className="block text-sm text-ink-soft">{choice.detail}</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}
