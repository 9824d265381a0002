import Link from "next/link";
import type { Lesson } from "@/content/learn";

/** The school's topics as drawing sheets: number, the marking they explain, title and one line. */
export function TopicCards({ lessons }: { lessons: readonly Lesson[] }) {
  return (
    <ol className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
      {lessons.map((lesson, index) => (
        <li key={lesson.slug} className="relative flex flex-col rounded border border-rule bg-sheet p-4 hover:border-accent has-focus-visible:outline-2 has-focus-visible:outline-offset-2 has-focus-visible:outline-accent">
          <p className="flex items-baseline justify-between gap-3 font-mono text-xs text-ink-soft">
            <span>Sheet {String(index + 1).padStart(2, "0")}</span>
            <span aria-hidden="true" className="truncate text-accent">
              {lesson.sample}
            </span>
          </p>
          <h2 className="mt-3 text-lg font-semibold">
            <Link
              href={`/learn/${lesson.slug}`}
              prefetch={false}
              className="underline-offset-4 after:absolute after:inset-0 hover:text-accent hover:underline focus-visible:outline-none"
            >
              {lesson.shortTitle}
            </Link>
          </h2>
          <p className="mt-1 text-sm text-ink-soft">{lesson.summary}</p>
        </li>
      ))}
    </ol>
  );
}
