import { describe, expect, it } from "vitest";
import { findLesson, learnSlugs, lessons } from "@/content/learn";
import { sidewallParts } from "@/content/sidewall-parts";
import { parseMarking } from "@/lib/tire";

describe("Sidewall school lessons", () => {
  it("are exactly the nine topics other screens link to, in order", () => {
    expect(lessons.map((lesson) => lesson.slug)).toEqual([
      "load-index",
      "speed-symbols",
      "load-range",
      "dot-code",
      "utqg",
      "winter-marks",
      "run-flat-and-xl",
      "overall-diameter",
      "tread-depth",
    ]);
    expect(learnSlugs).toHaveLength(9);
    expect(findLesson("no-such-topic")).toBeUndefined();
    expect(findLesson("toString")).toBeUndefined();
  });

  it("cover every topic the reader's part explanations point to", () => {
    for (const part of Object.values(sidewallParts)) {
      if (part.learnTopic) expect(findLesson(part.learnTopic), part.learnTopic).toBeDefined();
    }
  });

  it("work the tread-depth example with the core: 4/32 in of wear takes 6.35 mm off the diameter (2 × 4 × 0.79375 mm, worked by hand)", () => {
    const text = JSON.stringify(findLesson("tread-depth"));
    expect(text).toContain("3.2 mm of tread on each side");
    expect(text).toContain("shaved to 8/32 in");
    expect(text).toMatch(/vehicle maker/);
    expect(text).toMatch(/qualified fitter/);
  });

  it("state the pressures at which a passenger load index is defined: SL 250 kPa (36 psi), XL 290 kPa (42 psi) (ETRTO, from memory)", () => {
    const text = JSON.stringify(findLesson("load-index"));
    expect(text).toMatch(/250 kPa[^"]*36 psi|36 psi[^"]*250 kPa/);
    expect(text).toMatch(/290 kPa[^"]*42 psi|42 psi[^"]*290 kPa/);
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

  const textOf = (slug: string) => findLesson(slug)?.sections.flatMap((section) => section.paragraphs).join(" ") ?? "";

  it("say that passenger tires carry no dual rating and do not belong on dual wheels (common practice)", () => {
    expect(textOf("load-index")).toContain("Passenger tires show one index only: they carry no dual rating and do not belong on dual wheels.");
    expect(findLesson("load-index")?.commonPractice.join(" ")).toMatch(/no dual rating and do not belong on dual wheels/);
  });

  it("name UN Regulation No. 54, Annex 4 among the load table's published copies (from memory beyond index 200)", () => {
    expect(findLesson("load-index")?.standards.map((standard) => standard.name)).toContain("UN Regulation No. 54, Annex 4");
  });

  it("explain three-symbol plant codes: the April 2015 amendment, 13-symbol TINs, two-symbol codes until April 2025 (49 CFR 574.5; 80 FR 19553)", () => {
    const text = textOf("dot-code");
    expect(text).toContain("three-symbol codes");
    expect(text).toContain("13 symbols");
    expect(text).toContain("April 2025");
  });

  it("tell reinforced RF after the service description from run-flat RF inside the size (common practice)", () => {
    const text = textOf("run-flat-and-xl");
    expect(text).toContain("RF after the service description, as in 225/45R17 94W RF, means reinforced: an extra-load tire.");
    expect(text).toContain("RF inside the size, as in 225/45RF17 94W, means run-flat.");
  });

  it("work the speedometer example through: 265/70R17 to 285/70R17 is +3.5 %, 100 km/h shown is about 103 km/h (worked example)", () => {
    const text = findLesson("overall-diameter")?.sections.flatMap((section) => section.paragraphs).join(" ");
    expect(text).toContain("a change of +3.5 %");
    expect(text).toContain("shows 100 km/h / 62 mph, the car really does about 103 km/h / 64 mph");
    // 20 × 25.4 + 2 × 285 × 0.50 = 793 mm (nominal geometry).
    expect(text).toContain("508 mm + 2 × 142.5 mm = 793 mm / 31.2 in");
  });
});
