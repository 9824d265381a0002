import { LOAD_RANGES, LT_MAX_PRESSURE_PSI, plyRatingForLoadRange, psiToKpa } from "@/lib/tire";
import { bothPressures } from "./figures";
import type { Lesson } from "./types";

// Ply ratings per load range and the typical LT pressures are read from the tire core (common
// practice). The history of cotton plies, the load-and-inflation behaviour and the scope of the
// TRA and FMVSS 139 markings are written from memory.
const first = LOAD_RANGES[0] ?? "B";
const last = LOAD_RANGES[LOAD_RANGES.length - 1] ?? "N";
const pressureE = LT_MAX_PRESSURE_PSI.E;
const pressureC = LT_MAX_PRESSURE_PSI.C;

export const loadRangeLesson: Lesson = {
  slug: "load-range",
  title: "Load range and ply rating",
  shortTitle: "Load range",
  summary: "On light-truck and trailer tires, a letter (C, D, E…) for how strong the tire is and how much air it may hold.",
  sample: "Load Range E",
  sections: [
    {
      heading: "A strength class, not a count",
      paragraphs: [
        "Early tires were built from layers of cotton cord, and a stronger tire simply had more of them. Today a few layers of polyester, nylon or steel do the same work, so the ply rating no longer counts anything: it names a strength class, as strong as a tire once built with that many cotton plies.",
        `The load range letter says the same thing more briefly. The letters run from ${first} to ${last}; load range E is a ${plyRatingForLoadRange("E")}-ply rating, load range C a ${plyRatingForLoadRange("C")}-ply rating.`,
      ],
    },
    {
      heading: "Where you see it",
      paragraphs: [
        "Light-truck tires show it in words (LOAD RANGE E), in short (LRE) or as a ply rating (10 PR). You find it on LT sizes such as LT265/75R16, on flotation sizes such as 33x12.50R15LT, and on trailer (ST) tires.",
        "Passenger tires do not use load ranges. They come as standard load (SL) or Extra Load (XL) instead.",
      ],
    },
    {
      heading: "More strength means more pressure",
      paragraphs: [
        pressureE !== undefined && pressureC !== undefined
          ? `A stronger carcass can hold more air, and more air lets the tire carry more. A load range E tire is commonly allowed up to ${bothPressures(psiToKpa(pressureE))} cold, a load range C tire up to ${bothPressures(psiToKpa(pressureC))}. The sidewall states the exact figure for each tire.`
          : "A stronger carcass can hold more air, and more air lets the tire carry more. The sidewall states the maximum cold pressure for each tire.",
        "At the same pressure, a tire of a higher load range carries about what a lower one of the same size carries. The extra capacity only comes with the extra air, so a fitter sets the pressure from the maker's load-and-inflation table, never by guesswork.",
      ],
    },
    {
      heading: "Choosing a replacement",
      paragraphs: [
        "A replacement needs the same load range or a higher one. A higher range rides a little firmer, but never carries less.",
        "Where the vehicle calls for LT tires, do not fit passenger tires, even of the same size: they are built for lighter work.",
      ],
    },
  ],
  standards: [
    { name: "Tire and Rim Association (TRA) Year Book", covers: "load-range letters and ply ratings of LT and ST tires" },
    { name: "FMVSS 139 (49 CFR 571.139)", covers: "the maximum load and pressure marked on light-vehicle tires, LT included" },
  ],
  commonPractice: [
    "The pressures in the table are typical maximum cold pressures of LT tires by load range (common practice); the figure on your own sidewall governs.",
    "Keep the same load range on both tires of an axle (common practice).",
  ],
  readerExample: "LT265/75R16 123/120S Load Range E",
  related: ["load-index", "run-flat-and-xl", "speed-symbols"],
  table: "load-range",
  showCautions: true,
};
