import { PageIntro } from "@/components/ui/page-intro";
import { SafetyCautions } from "@/components/ui/safety-cautions";
import type { Lesson } from "@/content/learn";
import { LessonLinks } from "./lesson-links";
import { LessonTable } from "./lesson-table";
import { LessonTitleBlock } from "./lesson-title-block";

/** One Sidewall school lesson: plain-words sections, the standards behind them, its table, where next. */
export function LessonArticle({ lesson, sheet, sheets }: { lesson: Lesson; sheet: number; sheets: number }) {
  return (
    <article className="flex flex-col gap-8">
      <div>
        <PageIntro eyebrow="Sidewall school" title={lesson.title}>
          <p>{lesson.summary}</p>
        </PageIntro>
        <LessonTitleBlock lesson={lesson} sheet={sheet} sheets={sheets} />
      </div>
      <div className="flex max-w-3xl flex-col gap-6">
        {lesson.sections.map((section, index) => (
          <section key={section.heading} aria-labelledby={`section-${index}`}>
            <h2 id={`section-${index}`} className="text-xl font-semibold">
              {section.heading}
            </h2>
            {section.paragraphs.map((paragraph) => (
              <p key={paragraph} className="mt-2 leading-relaxed">
                {paragraph}
              </p>
            ))}
          </section>
        ))}
        {lesson.commonPractice.length > 0 ? (
          <aside aria-labelledby="practice-heading" className="rounded border border-dashed border-ink/50 px-4 py-3">
            <h2 id="practice-heading" className="font-semibold">
              Common practice, not a rule
            </h2>
            <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">
              {lesson.commonPractice.map((note) => (
                <li key={note}>{note}</li>
              ))}
            </ul>
          </aside>
        ) : null}
      </div>
      {lesson.table ? <LessonTable kind={lesson.table} /> : null}
      <div className="flex max-w-4xl flex-col gap-6">
        <LessonLinks lesson={lesson} />
        {lesson.showCautions ? <SafetyCautions /> : null}
      </div>
    </article>
  );
}
