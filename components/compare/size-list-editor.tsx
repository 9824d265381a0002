"use client";

import { MAX_COMPARED_SIZES } from "@/lib/compare/compare-limits";
import { LineSample } from "./line-sample";
import type { SizeEntry } from "./size-entry";

interface SizeListEditorProps {
  entries: SizeEntry[];
  onChange: (id: number, text: string) => void;
  onRemove: (id: number) => void;
  onMove: (id: number, offset: -1 | 1) => void;
  onAdd: () => void;
}

const iconButton = "inline-flex size-11 items-center justify-center rounded border border-rule text-lg hover:border-accent disabled:opacity-40";

/** The sizes being compared: typed, reordered and removed in place; the first one is the reference. */
export function SizeListEditor({ entries, onChange, onRemove, onMove, onAdd }: SizeListEditorProps) {
  return (
    <div className="flex flex-col gap-3">
      <ol className="flex flex-col gap-2">
        {entries.map((entry, index) => (
          <li key={entry.id} className="flex flex-wrap items-end gap-2">
            <label className="flex min-w-0 flex-1 flex-col gap-1 text-sm">
              <span className="flex items-center gap-2">
                <LineSample index={index} />
                {index === 0 ? "Reference size (the one the speedometer is set for)" : `Size ${index + 1}`}
              </span>
              <input
                value={entry.text}
                onChange={(event) => onChange(entry.id, event.target.value)}
                aria-invalid={entry.text.trim() !== "" && entry.problem !== null}
                aria-describedby={entry.problem !== null && entry.text.trim() ? `size-error-${entry.id}` : undefined}
                placeholder="e.g. 275/55R20"
                autoCapitalize="characters"
                autoComplete="off"
                spellCheck={false}
                className="min-h-11 w-full rounded border border-ink/60 bg-sheet px-3 font-mono text-ink aria-invalid:border-danger"
              />
              {entry.problem !== null && entry.text.trim() ? (
                <span id={`size-error-${entry.id}`} className="text-danger">
                  {entry.problem}
                </span>
              ) : null}
            </label>
            <div className="flex gap-1">
              <button type="button" className={iconButton} onClick={() => onMove(entry.id, -1)} disabled={index === 0} aria-label={`Move size ${index + 1} up`}>
                ↑
              </button>
              <button type="button" className={iconButton} onClick={() => onMove(entry.id, 1)} disabled={index === entries.length - 1} aria-label={`Move size ${index + 1} down`}>
                ↓
              </button>
              <button type="button" className={iconButton} onClick={() => onRemove(entry.id)} disabled={entries.length <= 1} aria-label={`Remove size ${index + 1}`}>
                ×
              </button>
            </div>
          </li>
        ))}
      </ol>
      {entries.length < MAX_COMPARED_SIZES ? (
        <button type="button" onClick={onAdd} className="min-h-11 self-start rounded border border-accent px-4 font-semibold text-accent">
          Add a size
        </button>
      ) : (
        <p className="text-sm text-ink-soft">Four sizes at most; remove one to add another.</p>
      )}
    </div>
  );
}
