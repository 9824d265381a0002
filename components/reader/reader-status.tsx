import type { ParseResult } from "@/lib/tire/types";
import { formatSize } from "@/lib/tire/format";

/** What was read, or what is missing and how to fix it; announced politely as the text changes. */
export function ReaderStatus({ text, result }: { text: string; result: ParseResult }) {
  return (
    <div aria-live="polite" className="text-sm">
      {!text.trim() ? null : result.ok ? (
        <ReadSummary result={result} />
      ) : (
        <div role="alert" className="rounded border-l-4 border-danger bg-sheet px-3 py-2">
          <p className="font-semibold text-danger">{result.error.message}</p>
          {result.error.suggestion ? <p className="text-ink">{result.error.suggestion}</p> : null}
          <p className="text-ink-soft">
            A size looks like <span className="font-mono">285/50R20</span>; with its service description,{" "}
            <span className="font-mono">285/50R20 119S</span>.
          </p>
        </div>
      )}
    </div>
  );
}

function ReadSummary({ result }: { result: Extract<ParseResult, { ok: true }> }) {
  const read = [
    result.size ? formatSize(result.size) : null,
    result.service ? `${result.service.loadIndex}${result.service.loadIndexDual ? `/${result.service.loadIndexDual}` : ""}${result.service.speedSymbol}` : null,
  ].filter(Boolean);
  return (
    <div className="flex flex-col gap-1">
      <p>
        {read.length > 0 ? (
          <>
            Read as <span className="font-mono font-semibold">{read.join(" ")}</span>
          </>
        ) : (
          "No tire size in this text yet: add one like 285/50R20 to see it drawn."
        )}
      </p>
      {result.assumptions.map((note) => (
        <p key={note} className="text-ink-soft">
          {note}
        </p>
      ))}
      {result.warnings.map((warning) => (
        <p key={warning} className="border-l-4 border-caution bg-caution-soft px-3 py-1 text-ink">
          {warning}
        </p>
      ))}
    </div>
  );
}
