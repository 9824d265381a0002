import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { LessonArticle } from "@/components/learn/lesson-article";
import { findLesson, learnSlugs, lessons } from "@/content/learn";

type Params = Promise<{ topic: string }>;

/** Only the school's own topics exist; any other address answers 404. */
export const dynamicParams = false;

export function generateStaticParams(): { topic: string }[] {
  return learnSlugs.map((topic) => ({ topic }));
}

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const lesson = findLesson((await params).topic);
  return lesson ? { title: `${lesson.title} · Sidewall school`, description: lesson.summary } : {};
}

export default async function LessonPage({ params }: { params: Params }) {
  const { topic } = await params;
  const lesson = findLesson(topic);
  if (!lesson) notFound();
  return <LessonArticle lesson={lesson} sheet={lessons.indexOf(lesson) + 1} sheets={lessons.length} />;
}
