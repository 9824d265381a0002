import type { DescribedPart } from "@/lib/tire/describe";

interface Segment {
  text: string;
  keys: string[];
}

/** Cuts the input at every span boundary; each piece knows every part whose span covers it. */
function segmentsOf(input: string, parts: DescribedPart[]): Segment[] {
  const pointed = parts.filter((part) => part.span !== null);
  const cuts = new Set([0, input.length]);
  for (const part of pointed) {
    cuts.add(part.span!.start);
    cuts.add(part.span!.end);
  }
  const sorted = [...cuts].filter((cut) => cut >= 0 && cut <= input.length).sort((a, b) => a - b);
  const segments: Segment[] = [];
  for (let index = 0; index < sorted.length - 1; index++) {
    const start = sorted[index]!;
    const end = sorted[index + 1]!;
    const keys = pointed.filter((part) => part.span!.start <= start && part.span!.end >= end).map((part) => part.key);
    segments.push({ text: input.slice(start, end), keys });
  }
  return segments;
}

/** The typed text again, each recognised part underlined; the active part stands out. */
export function MarkedEcho({ input, parts, active }: { input: string; parts: DescribedPart[]; active: string | null }) {
  return (
    <p aria-hidden="true" className="min-h-8 font-mono text-lg break-all whitespace-pre-wrap text-ink-soft">
      {segmentsOf(input, parts).map((segment, index) =>
        segment.keys.length > 0 ? (
          <span
            key={index}
            data-parts={segment.keys.join(" ")}
            className={`rounded-sm underline decoration-2 underline-offset-4 transition-colors ${
              active !== null && segment.keys.includes(active) ? "bg-accent text-sheet decoration-accent" : "text-ink decoration-accent/60"
            }`}
          >
            {segment.text}
          </span>
        ) : (
          <span key={index}>{segment.text}</span>
        ),
      )}
    </p>
  );
}
