import { dotCodeLesson } from "./dot-code";
import { loadIndexLesson } from "./load-index";
import { loadRangeLesson } from "./load-range";
import { overallDiameterLesson } from "./overall-diameter";
import { runFlatAndXlLesson } from "./run-flat-and-xl";
import { speedSymbolsLesson } from "./speed-symbols";
import { treadDepthLesson } from "./tread-depth";
import { learnSlugs, type LearnSlug, type Lesson } from "./types";
import { utqgLesson } from "./utqg";
import { winterMarksLesson } from "./winter-marks";

export { learnSlugs, type LearnSlug, type Lesson } from "./types";

const lessonsBySlug: Record<LearnSlug, Lesson> = {
  "load-index": loadIndexLesson,
  "speed-symbols": speedSymbolsLesson,
  "load-range": loadRangeLesson,
  "dot-code": dotCodeLesson,
  utqg: utqgLesson,
  "winter-marks": winterMarksLesson,
  "run-flat-and-xl": runFlatAndXlLesson,
  "overall-diameter": overallDiameterLesson,
  "tread-depth": treadDepthLesson,
};

/** Every lesson, in the order the school lists them. */
export const lessons: readonly Lesson[] = learnSlugs.map((slug) => lessonsBySlug[slug]);

export function findLesson(slug: string): Lesson | undefined {
  return Object.hasOwn(lessonsBySlug, slug) ? lessonsBySlug[slug as LearnSlug] : undefined;
}
