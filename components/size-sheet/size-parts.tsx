import Link from "next/link";
import { explainPart, moreAboutLabel } from "@/content/sidewall-parts";
import { describeMarking, type Marking } from "@/lib/tire";

/** Each part of the designation with its reading in both unit systems and its plain-words meaning. */
export function SizeParts({ marking }: { marking: Marking }) {
  const imperial = new Map(describeMarking(marking, "imperial").map((part) => [part.key, part.reading]));
  return (
    <dl className="grid gap-3 sm:grid-cols-2">
      {describeMarking(marking, "metric").map((part) => {
        const explanation = explainPart(part.key, marking.size);
        const otherReading = imperial.get(part.key);
        return (
          <div key={part.key} className="rounded border border-rule bg-sheet p-3">
            <dt className="font-semibold">{explanation.title}</dt>
            <dd className="mt-1 font-mono text-sm text-accent">
              {part.reading}
              {otherReading && otherReading !== part.reading ? <span className="block text-ink-soft">{otherReading}</span> : null}
            </dd>
            <dd className="mt-1 text-sm text-ink-soft">{explanation.summary}</dd>
            {explanation.learnTopic ? (
              <dd className="mt-1 text-sm">
                <Link href={`/learn/${explanation.learnTopic}`} className="text-accent underline underline-offset-4">
                  {moreAboutLabel(explanation.title)}
                </Link>
              </dd>
            ) : null}
          </div>
        );
      })}
    </dl>
  );
}
