import { SPEED_SYMBOLS } from "@/lib/tire";
import { speedOfSymbol } from "./figures";
import type { Lesson } from "./types";

// The speed figures are read from the tire core's table. How ZR and the bracketed service
// description are marked, the laboratory test of UN R30 and the winter-tire allowance in some
// countries are written from memory.
const slowest = SPEED_SYMBOLS[0]?.symbol ?? "A1";

export const speedSymbolsLesson: Lesson = {
  slug: "speed-symbols",
  title: "Speed symbols: the letter after the load index",
  shortTitle: "Speed symbols",
  summary: "A letter for the highest speed the tire is built to sustain under its load, ordered by speed, not by the alphabet.",
  sample: "95H",
  sections: [
    {
      heading: "What the letter promises",
      paragraphs: [
        `In 119S or 95H, the letter is the speed symbol. It stands for the highest speed at which the tire can carry the load of its index, correctly inflated, for a sustained time. S means ${speedOfSymbol("S")}; H means ${speedOfSymbol("H")}.`,
        "The rating is proven on a test drum in a laboratory, on a new tire. It is not a speed to drive at, and a tire that is under-inflated, overloaded, worn, damaged or repaired may not reach it.",
      ],
    },
    {
      heading: "Why H is out of place",
      paragraphs: [
        `The letters do not follow the alphabet. The scale starts at ${slowest} (${speedOfSymbol(slowest)}) for slow machines, climbs through the letters to U (${speedOfSymbol("U")}), then comes H at ${speedOfSymbol("H")}, then V (${speedOfSymbol("V")}), W (${speedOfSymbol("W")}) and Y (${speedOfSymbol("Y")}). H sits out of order for historical reasons, so always compare the speeds, never the letters.`,
        `(Y), in brackets, is the top of the scale: the tire is rated above ${speedOfSymbol("Y")}, and its maker states how far above.`,
      ],
    },
    {
      heading: "ZR in the size",
      paragraphs: [
        `A Z before the R, as in 245/40ZR18, marks a tire built for more than ${speedOfSymbol("V")}. Newer ZR tires also carry a service description, such as 97Y; one in brackets, such as (97Y), means the tire goes beyond ${speedOfSymbol("Y")}. A ZR size with no service description is only known to be rated above ${speedOfSymbol("V")}.`,
      ],
    },
    {
      heading: "Choosing a replacement",
      paragraphs: [
        "The vehicle's placard or handbook gives the speed symbol it was built with. A replacement must have the same symbol or a faster one, compared by speed: an H tire does not replace a V tire, even though H comes later in the alphabet.",
        "Some countries let a winter tire have a lower speed symbol than the vehicle needs, as long as a reminder of its top speed sits in the driver's view. That is a local rule: check yours before relying on it.",
      ],
    },
  ],
  standards: [
    { name: "UN Regulation No. 30 (ECE R30)", covers: "the speed-symbol table and the laboratory load/speed test" },
    { name: "French Arrêté of 24 October 1994, Annex I", covers: "the published speed-symbol table, A1 to V" },
    { name: "EU tyre database under Regulation (EU) 2020/740", covers: "W, Y and (Y) as listed for registered tyres" },
  ],
  commonPractice: [
    "When a vehicle wears tires with different speed symbols, the slowest one sets the limit for the whole vehicle (common practice).",
    "Fit the same speed symbol on all four wheels, or at least on each axle (common practice).",
  ],
  readerExample: "P215/65R15 95H",
  related: ["load-index", "winter-marks", "run-flat-and-xl"],
  table: "speed-symbols",
  showCautions: true,
};
