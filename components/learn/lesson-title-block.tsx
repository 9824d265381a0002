import type { Lesson } from "@/content/learn";
import { UnitsNote } from "./units-note";

/** A drawing-style title block: the standards the lesson follows, its units and its sheet number. */
export function LessonTitleBlock({ lesson, sheet, sheets }: { lesson: Lesson; sheet: number; sheets: number }) {
  const label = "font-mono text-xs tracking-widest text-ink-soft uppercase";
  return (
    <dl className="grid max-w-3xl border border-ink/60 bg-sheet text-sm sm:grid-cols-[9rem_minmax(0,1fr)]">
      <dt className={`${label} border-b border-rule px-3 pt-2 sm:border-r sm:pb-2`}>Follows</dt>
      <dd className="border-b border-rule px-3 pb-2 sm:pt-2">
        <ul className="flex flex-col gap-1">
          {lesson.standards.map((standard) => (
            <li key={standard.name}>
              <span className="font-semibold">{standard.name}</span>
              <span className="text-ink-soft">: {standard.covers}</span>
            </li>
          ))}
        </ul>
      </dd>
      <dt className={`${label} border-b border-rule px-3 pt-2 sm:border-r sm:pb-2`}>Units</dt>
      <dd className="border-b border-rule px-3 pb-2 text-ink-soft sm:pt-2">
        <UnitsNote />
      </dd>
      <dt className={`${label} px-3 pt-2 sm:border-r sm:pb-2`}>Sheet</dt>
      <dd className="px-3 pb-2 font-mono sm:pt-2">
        {sheet} of {sheets}
      </dd>
    </dl>
  );
}
