"use client";

import { useId, useRef } from "react";
import { readerExamples } from "./examples";

export function MarkingInput({ value, onChange }: { value: string; onChange: (value: string) => void }) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const choose = (text: string) => {
    onChange(text);
    input.current?.focus();
  };
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={id} className="font-semibold">
        Type or paste what&apos;s on your sidewall
      </label>
      <div className="relative">
        <input
          ref={input}
          id={id}
          type="text"
          value={value}
          onChange={(event) => onChange(event.target.value)}
          placeholder="e.g. 285/50R20 119S"
          autoComplete="off"
          autoCorrect="off"
          autoCapitalize="characters"
          spellCheck={false}
          enterKeyHint="done"
          maxLength={2000}
          aria-describedby={`${id}-hint`}
          className="min-h-14 w-full rounded border-2 border-ink/70 bg-sheet py-3 pr-12 pl-4 font-mono text-xl text-ink shadow-sm placeholder:text-ink-soft/80 focus:border-accent focus:outline-none sm:text-2xl"
        />
        {value ? (
          <button
            type="button"
            onClick={() => choose("")}
            aria-label="Clear"
            className="absolute top-1/2 right-1 inline-flex size-11 -translate-y-1/2 items-center justify-center rounded text-2xl text-ink-soft hover:text-ink"
          >
            ×
          </button>
        ) : null}
      </div>
      <p id={`${id}-hint`} className="text-sm text-ink-soft">
        The size is the large group of numbers, like 285/50R20. Add the load index and speed symbol after it, or a DOT code, UTQG grades or
        winter marks.
      </p>
      <div className="-mx-4 flex items-center gap-2 overflow-x-auto px-4 pb-1 sm:mx-0 sm:flex-wrap sm:px-0" role="group" aria-label="Examples to try">
        <span className="text-sm text-ink-soft">Try:</span>
        {readerExamples.map((example) => (
          <button
            key={example}
            type="button"
            onClick={() => choose(example)}
            className="min-h-9 shrink-0 rounded-full border border-rule bg-sheet px-3 font-mono text-xs text-ink hover:border-accent hover:text-accent"
          >
            {example}
          </button>
        ))}
      </div>
    </div>
  );
}
