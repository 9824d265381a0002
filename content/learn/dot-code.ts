import { parseMarking } from "@/lib/tire";
import type { Lesson } from "./types";

// The April 2015 amendment of 49 CFR 574.5 (three-symbol plant codes for new tires, TINs of 13
// symbols) is read from the final rule's summary, 80 FR 19553; its ten-year lead time for plants
// with two-symbol codes (to April 2025) from a trade report of that rule. The letters left out, the
// partial TIN on the second sidewall and tire registration are written from memory of 49 CFR 574.
// The age thresholds match the tire core's date warnings (common practice).
const example = "DOT 4B7X 2HRT 1523";
const read = parseMarking(example);
const dot = read.ok ? read.dot : null;
if (!dot) throw new Error(`The DOT example ${example} no longer reads`);

export const dotCodeLesson: Lesson = {
  slug: "dot-code",
  title: "The DOT code (TIN) and how old a tire is",
  shortTitle: "DOT code and tire age",
  summary: "The code after “DOT” names the plant that made the tire and ends with the week and year it was made.",
  sample: "DOT … 1523",
  sections: [
    {
      heading: "What follows the letters DOT",
      paragraphs: [
        "DOT on a sidewall is the maker's statement that the tire meets the US federal safety standards. The letters and digits after it are the tire identification number, or TIN.",
        "The TIN reads in three parts. First comes the plant code, which names the factory. Next comes a group the maker uses for its own purposes, often the size and the tire line. Last comes the date code.",
        "To avoid mix-ups with digits, the letters G, I, O, Q, S and Z are never used in a TIN.",
      ],
    },
    {
      heading: "Two- and three-symbol plant codes",
      paragraphs: [
        "Plant codes used to be two symbols long, and the two-symbol codes ran out. An amendment to the US rule that took effect in April 2015 gives plants making new tires three-symbol codes, and sets the TIN of a new tire at 13 symbols.",
        "Plants that already had a two-symbol code were given ten years to change over. A tire made before April 2025 may still show a two-symbol plant code; one made from April 2025 on shows a three-symbol code. Either way the plant code comes first and the date code last, so the age reads the same.",
      ],
    },
    {
      heading: "Reading the date",
      paragraphs: [
        `The last four digits are the week and then the year of manufacture. In ${example}, 1523 means week ${dot.week} of ${dot.year}.`,
        "Tires made before 2000 used three digits: the week and the last digit of the year. Such a tire is far too old to use today.",
        "The full TIN, date included, only has to be on one sidewall. If you cannot find the date, look on the other side of the tire, which may be facing the car.",
      ],
    },
    {
      heading: "How old is too old",
      paragraphs: [
        "Rubber ages whether the tire is driven or not, so a tire can look fine and still be past its best. Spares and tires on vehicles that rarely move age too.",
        "Heat, sunlight, low pressure and heavy loads speed the ageing up. Cracks in the sidewall or between the tread blocks are signs to have the tire checked at once.",
      ],
    },
    {
      heading: "Why the whole code matters",
      paragraphs: [
        "Recalls name tires by their TIN. Note the full codes of your tires when they are fitted, and register them with the maker (the shop can do it for you) so that you hear about a recall.",
      ],
    },
  ],
  standards: [
    {
      name: "49 CFR 574.5, Tire identification requirements",
      covers: "the TIN and its date code, as amended in April 2015: three-symbol plant codes and 13-symbol TINs for new tires, two-symbol codes phased out by April 2025",
    },
    { name: "49 CFR 574.7 and 574.8", covers: "registering tires so that owners hear of recalls" },
  ],
  commonPractice: [
    "Have tires older than about six years inspected by a tire professional; many tire makers advise replacing tires ten years after they were made, whatever the tread (common practice).",
    "A new tire may have waited in a warehouse for a while: ask to see its date code before it is fitted (common practice).",
  ],
  readerExample: example,
  related: ["utqg", "winter-marks", "load-index"],
  showCautions: false,
};
