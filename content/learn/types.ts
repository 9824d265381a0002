/** The Sidewall school topics; other screens link to these slugs. */
export const learnSlugs = [
  "load-index",
  "speed-symbols",
  "load-range",
  "dot-code",
  "utqg",
  "winter-marks",
  "run-flat-and-xl",
  "overall-diameter",
  "tread-depth",
] as const;

export type LearnSlug = (typeof learnSlugs)[number];

/** A table built from the tire core's own tables, shown searchable on the lesson. */
export type LessonTable = "load-index" | "speed-symbols" | "load-range";

export interface LessonSection {
  heading: string;
  paragraphs: readonly string[];
}

/** A published standard or regulation the lesson follows, and what it covers here. */
export interface FollowedStandard {
  name: string;
  covers: string;
}

export interface Lesson {
  slug: LearnSlug;
  /** The page heading. */
  title: string;
  /** The short name used on cards and in links between lessons. */
  shortTitle: string;
  /** One line: what the topic answers. */
  summary: string;
  /** A piece of a marking that shows the topic at a glance, set in monospace on the card. */
  sample: string;
  sections: readonly LessonSection[];
  standards: readonly FollowedStandard[];
  /** Advice that is common practice rather than a rule, said as such. */
  commonPractice: readonly string[];
  /** A marking to open in the Sidewall reader. */
  readerExample: string;
  related: readonly LearnSlug[];
  table?: LessonTable;
  /** Whether the lesson touches a choice of tire, and so ends with the usual cautions. */
  showCautions: boolean;
}
