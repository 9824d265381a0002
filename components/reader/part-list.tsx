import Link from "next/link";
import { explainPart, moreAboutLabel } from "@/content/sidewall-parts";
import type { TireSize } from "@/lib/tire";
import type { DescribedPart, SidewallPartKey } from "@/lib/tire/describe";

interface PartListProps {
  parts: DescribedPart[];
  /** The size read, whose kind and rim choose some explanations (inch widths, half-inch rims). */
  size: TireSize | null;
  active: SidewallPartKey | null;
  onActivate: (key: SidewallPartKey | null) => void;
}

/** Each part of the marking, what it says here, and what it means in plain words. */
export function PartList({ parts, size, active, onActivate }: PartListProps) {
  return (
    <ol className="grid gap-3" onMouseLeave={() => onActivate(null)}>
      {parts.map((part) => {
        const explanation = explainPart(part.key, size);
        const isActive = active === part.key;
        return (
          <li
            key={part.key}
            data-part={part.key}
            onMouseEnter={() => onActivate(part.key)}
            className={`rounded border bg-sheet p-3 transition-colors ${isActive ? "border-accent" : "border-rule"}`}
          >
            <h3 className="flex flex-wrap items-baseline justify-between gap-x-3">
              <button
                type="button"
                aria-pressed={isActive}
                onFocus={() => onActivate(part.key)}
                onClick={() => onActivate(isActive ? null : part.key)}
                className="min-h-8 text-left font-semibold text-ink underline-offset-4 hover:underline"
              >
                {explanation.title}
              </button>
              <span className="font-mono text-sm text-accent">{part.reading}</span>
            </h3>
            <p className="mt-1 text-sm text-ink-soft">{explanation.summary}</p>
            {explanation.learnTopic ? (
              <Link href={`/learn/${explanation.learnTopic}`} prefetch={false} className="mt-1 inline-block text-sm text-accent underline underline-offset-4">
                {moreAboutLabel(explanation.title)}
              </Link>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}
