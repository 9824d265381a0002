import Link from "next/link";
import { findLesson, type Lesson } from "@/content/learn";

/** Where to go next: the marking in the Sidewall reader, the related lessons, and the school's index. */
export function LessonLinks({ lesson }: { lesson: Lesson }) {
  const related = lesson.related.map(findLesson).filter((other) => other !== undefined);
  const link = "font-semibold text-accent underline underline-offset-4 hover:decoration-2";
  return (
    <nav aria-label="Keep reading" className="grid gap-6 rounded border border-rule bg-sheet p-4 sm:grid-cols-2">
      <div>
        <h2 className="font-semibold">Try it on a sidewall</h2>
        <p className="mt-1 text-sm text-ink-soft">See each part of a real marking explained and drawn to scale.</p>
        <p className="mt-2">
          <Link href={`/?q=${encodeURIComponent(lesson.readerExample)}`} prefetch={false} className={`inline-block py-2.5 ${link}`}>
            Read <span className="font-mono">{lesson.readerExample}</span> in the Sidewall reader
          </Link>
        </p>
      </div>
      <div>
        <h2 className="font-semibold">Related topics</h2>
        <ul className="mt-1">
          {related.map((other) => (
            <li key={other.slug}>
              <Link href={`/learn/${other.slug}`} prefetch={false} className={`inline-flex min-h-11 items-center ${link}`}>
                {other.shortTitle}
              </Link>
            </li>
          ))}
          <li>
            <Link href="/learn" prefetch={false} className={`inline-flex min-h-11 items-center ${link}`}>
              All Sidewall school topics
            </Link>
          </li>
        </ul>
      </div>
    </nav>
  );
}
