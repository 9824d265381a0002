import { parseMarking } from "@/lib/tire";
import type { Lesson } from "./types";

// The scope of UTQG (passenger tires; snow, deep-tread, temporary and small-rim tires exempt), the
// treadwear course, the wet skid test and the laboratory heat test are written from memory of
// 49 CFR 575.104.
const example = "Treadwear 500 Traction A Temperature A";
const read = parseMarking(example);
const grades = read.ok ? read.utqg : null;
if (!grades) throw new Error(`The UTQG example ${example} no longer reads`);

export const utqgLesson: Lesson = {
  slug: "utqg",
  title: "UTQG: treadwear, traction and temperature grades",
  shortTitle: "UTQG grades",
  summary: "Three US grades on passenger tires: how the tread wore in a test, how it stopped on wet roads, and how it copes with heat.",
  sample: "500 A A",
  sections: [
    {
      heading: "Three grades in one line",
      paragraphs: [
        `Passenger tires sold in the United States carry a line such as “${example}”. Here the treadwear grade is ${grades.treadwear}, the traction grade ${grades.traction} and the temperature grade ${grades.temperature}.`,
        "Winter tires, deep-tread tires, temporary spares, tires for very small wheels and light-truck tires are not graded, so not every tire has the line.",
      ],
    },
    {
      heading: "Treadwear",
      paragraphs: [
        "The treadwear number compares the tire with a reference tire graded 100, after both have run on a set route on public roads in Texas. A grade of 400 means the tread wore about four times as slowly as the reference's on that route.",
        "Your own mileage depends on how and where you drive, on pressure, alignment and rotation. The maker sets the grade from its own test results, so treadwear numbers compare best between tires of the same maker.",
      ],
    },
    {
      heading: "Traction",
      paragraphs: [
        "Traction is graded AA, A, B or C, best first. It measures straight-line braking on wet asphalt and wet concrete with the wheels locked. It says nothing about cornering, dry roads, snow, ice or resisting aquaplaning.",
      ],
    },
    {
      heading: "Temperature",
      paragraphs: [
        "Temperature is graded A, B or C, best first. It shows how well the tire resists building up heat when run fast on a laboratory wheel; heat breaks tires down. C is the lowest level the federal standard accepts.",
        "The grade assumes correct pressure and load. Low pressure or an overloaded tire makes heat that no grade allows for.",
      ],
    },
  ],
  standards: [{ name: "49 CFR 575.104, Uniform Tire Quality Grading Standards", covers: "treadwear, traction and temperature grades, which tires carry them, and how each is tested" }],
  commonPractice: [
    "Compare treadwear grades between tires of one maker rather than across makers (common practice).",
    "Treat the traction grade as one wet-braking figure, not a measure of grip in general (common practice).",
  ],
  readerExample: example,
  related: ["dot-code", "winter-marks", "speed-symbols"],
  showCautions: true,
};
