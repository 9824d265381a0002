import { describe, expect, it } from "vitest";
import { findLesson, learnSlugs, lessons } from "@/content/learn";
import { sidewallParts } from "@/content/sidewall-parts";
import { parseMarking } from "@/lib/tire";

describe("Sidewall school lessons", () => {
  it("are exactly the eight topics other screens link to, in order", () => {
    expect(lessons.map((lesson) => lesson.slug)).toEqual([
      "load-index",
      "speed-symbols",
      "load-range",
      "dot-code",
      "utqg",
      "winter-marks",
      "run-flat-and-xl",
      "overall-diameter",
    ]);
    expect(learnSlugs).toHaveLength(8);
    expect(findLesson("no-such-topic")).toBeUndefined();
    expect(findLesson("toString")).toBeUndefined();
  });

  it("cover every topic the reader's part explanations point to", () => {
    for (const part of Object.values(sidewallParts)) {
      if (part.learnTopic) expect(findLesson(part.learnTopic), part.learnTopic).toBeDefined();
    }
  });

  it.each(lessons.map((lesson) => [lesson.slug, lesson] as const))("%s names its standards, related topics and a readable example", (_, lesson) => {
    expect(lesson.standards.length).toBeGreaterThan(0);
    expect(lesson.sections.length).toBeGreaterThan(0);
    expect(lesson.related.length).toBeGreaterThan(0);
    for (const related of lesson.related) {
      expect(related).not.toBe(lesson.slug);
      expect(findLesson(related)).toBeDefined();
    }
    for (const note of lesson.commonPractice) expect(note).toMatch(/common practice/);
    expect(parseMarking(lesson.readerExample).ok).toBe(true);
  });

  it("quote figures from the tire core: load index 119 is 1,360 kg / 2,998 lb (ISO 4000-1), H is 210 km/h / 130 mph (UN R30)", () => {
    const loadText = findLesson("load-index")?.sections.flatMap((section) => section.paragraphs).join(" ");
    expect(loadText).toContain("Row 119 says 1,360 kg / 2,998 lb per tire");
    const speedText = findLesson("speed-symbols")?.sections.flatMap((section) => section.paragraphs).join(" ");
    expect(speedText).toContain("H means 210 km/h / 130 mph");
  });

  it("work the speedometer example through: 265/70R17 to 285/70R17 is +3.5 %, 100 km/h shown is about 103 km/h (worked example)", () => {
    const text = findLesson("overall-diameter")?.sections.flatMap((section) => section.paragraphs).join(" ");
    expect(text).toContain("a change of +3.5 %");
    expect(text).toContain("shows 100 km/h / 62 mph, the car really does about 103 km/h / 64 mph");
    // 20 × 25.4 + 2 × 285 × 0.50 = 793 mm (nominal geometry).
    expect(text).toContain("508 mm + 2 × 142.5 mm = 793 mm / 31.2 in");
  });
});
