"use client";

import { useState, type DragEvent } from "react";

/**
 * Where a CSV is dropped or chosen. The zone is the label of a real file input, so a click, a tap,
 * Enter or Space on the focused input all open the file picker.
 */
export function ImportDropZone({ error, onFile, autoFocus }: { error: string | null; onFile: (file: File) => void; autoFocus: boolean }) {
  const [dragging, setDragging] = useState(false);

  function drop(event: DragEvent<HTMLLabelElement>) {
    event.preventDefault();
    setDragging(false);
    const file = event.dataTransfer.files[0];
    if (file) onFile(file);
  }

  return (
    <div className="flex flex-col gap-2">
      <input
        id="catalog-csv"
        type="file"
        accept=".csv,text/csv"
        autoFocus={autoFocus}
        aria-describedby={error ? "catalog-csv-error" : undefined}
        aria-invalid={error ? true : undefined}
        className="peer sr-only"
        onChange={(event) => {
          const file = event.currentTarget.files?.[0];
          event.currentTarget.value = "";
          if (file) onFile(file);
        }}
      />
      <label
        htmlFor="catalog-csv"
        onDragOver={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={drop}
        className={`flex min-h-40 cursor-pointer flex-col items-center justify-center gap-2 rounded-lg border-2 border-dashed p-6 text-center peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-accent ${
          dragging ? "border-accent bg-accent-soft" : error ? "border-danger bg-sheet" : "border-rule bg-sheet"
        }`}
      >
        <span className="text-lg font-semibold">Drop the catalog CSV here</span>
        <span className="inline-flex min-h-11 items-center rounded border border-accent px-4 font-semibold text-accent">or choose a file</span>
        <span className="text-sm text-ink-soft">CSV, up to 5 MB</span>
      </label>
      <p id="catalog-csv-error" role="alert" className="min-h-6 text-danger">
        {error ?? ""}
      </p>
    </div>
  );
}
