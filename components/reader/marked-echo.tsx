import type { DescribedPart } from "@/lib/tire/describe";

interface Piece {
  text: string;
  keys: string[];
}

/** A run of the typed text: the spaces between words, or one word cut into the parts that cover it. */
type Run = { space: Piece } | { word: Piece[] };

/** Cuts the input at every span boundary and at every edge of a space; each piece knows the parts covering it. */
function piecesOf(input: string, parts: DescribedPart[]): Piece[] {
  const pointed = parts.filter((part) => part.span !== null);
  const cuts = new Set([0, input.length]);
  for (const part of pointed) {
    cuts.add(part.span!.start);
    cuts.add(part.span!.end);
  }
  for (const space of input.matchAll(/\s+/g)) {
    cuts.add(space.index);
    cuts.add(space.index + space[0].length);
  }
  const sorted = [...cuts].filter((cut) => cut >= 0 && cut <= input.length).sort((a, b) => a - b);
  return sorted.slice(0, -1).map((start, index) => {
    const end = sorted[index + 1]!;
    const keys = pointed.filter((part) => part.span!.start <= start && part.span!.end >= end).map((part) => part.key);
    return { text: input.slice(start, end), keys };
  });
}

function runsOf(pieces: Piece[]): Run[] {
  const runs: Run[] = [];
  for (const piece of pieces) {
    const last = runs[runs.length - 1];
    if (/^\s/.test(piece.text)) runs.push({ space: piece });
    else if (last && "word" in last) last.word.push(piece);
    else runs.push({ word: [piece] });
  }
  return runs;
}

function PieceText({ piece, active }: { piece: Piece; active: string | null }) {
  if (piece.keys.length === 0) return <span>{piece.text}</span>;
  const lit = active !== null && piece.keys.includes(active);
  return (
    <span
      data-parts={piece.keys.join(" ")}
      className={`rounded-sm underline decoration-2 underline-offset-4 transition-colors ${lit ? "bg-accent text-sheet decoration-accent" : "text-ink decoration-accent/60"}`}
    >
      {piece.text}
    </span>
  );
}

/**
 * The typed text again, each recognised part underlined; the active part stands out. Lines break
 * only between words: each word is one inline block, which wraps inside only when it is wider
 * than the whole line.
 */
export function MarkedEcho({ input, parts, active }: { input: string; parts: DescribedPart[]; active: string | null }) {
  return (
    <p aria-hidden="true" className="min-h-8 font-mono text-lg whitespace-pre-wrap text-ink-soft">
      {runsOf(piecesOf(input, parts)).map((run, index) =>
        "space" in run ? (
          <PieceText key={index} piece={run.space} active={active} />
        ) : (
          <span key={index} data-word className="inline-block max-w-full [overflow-wrap:anywhere]">
            {run.word.map((piece, pieceIndex) => (
              <PieceText key={pieceIndex} piece={piece} active={active} />
            ))}
          </span>
        ),
      )}
    </p>
  );
}
