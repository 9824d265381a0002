import { parseMarking, REFERENCE_PRESSURE } from "@/lib/tire";
import { bothPressures } from "./figures";
import type { Lesson } from "./types";

// How run-flat and reinforced tires are marked, the need for pressure monitoring with run-flats and
// the makers' limits after a puncture are written from memory (UN R30, FMVSS 138); RF meaning
// reinforced after the service description is common practice. The XL reference pressure is read
// from the tire core, which must read both RF examples as the text says.
const RUN_FLAT_EXAMPLE = "225/45RF17 94W";
const REINFORCED_EXAMPLE = "225/45R17 94W RF";
const runFlat = parseMarking(RUN_FLAT_EXAMPLE);
const reinforced = parseMarking(REINFORCED_EXAMPLE);
if (!runFlat.ok || !runFlat.runFlat || runFlat.extraLoad || !reinforced.ok || !reinforced.extraLoad || reinforced.runFlat) {
  throw new Error("The RF examples no longer read as run-flat and as reinforced");
}

export const runFlatAndXlLesson: Lesson = {
  slug: "run-flat-and-xl",
  title: "Run-flat and Extra Load (XL) tires",
  shortTitle: "Run-flat and XL",
  summary: "Two kinds of reinforced tire: one keeps you moving after a puncture, the other carries more weight at a higher pressure.",
  sample: "RF … XL",
  sections: [
    {
      heading: "Run-flat: a short way home after a puncture",
      paragraphs: [
        "A run-flat tire has stiff sidewalls, or a support inside, that hold the car up after the air is gone. It can be driven a limited distance at a reduced speed, as the vehicle and tire makers state in their handbooks, to reach a safe place or a shop.",
        "It is marked RF inside the size, as in 225/45RF17, and makers often add a symbol of their own. Because a deflated run-flat looks and feels almost normal, a car that uses them must have a working tire-pressure warning system.",
      ],
    },
    {
      heading: "Replacing run-flats",
      paragraphs: [
        "Cars built for run-flats often carry no spare wheel and no jack. Replace run-flat tires with run-flat tires, so the car keeps its way home.",
        "Many makers do not allow a run-flat to be repaired once it has been driven without air, because the damage inside cannot be seen.",
      ],
    },
    {
      heading: "Extra Load (XL): more weight at more pressure",
      paragraphs: [
        "An Extra Load tire, marked XL, EXTRA LOAD or REINFORCED, is a passenger tire built to hold more pressure than a standard-load (SL) tire of the same size. With that extra pressure it carries more, so it has a higher load index.",
        `The same two letters mean two things, and where they stand tells which. RF after the service description, as in ${REINFORCED_EXAMPLE}, means reinforced: an extra-load tire. RF inside the size, as in ${RUN_FLAT_EXAMPLE}, means run-flat.`,
        `The load index of an SL tire is set at ${bothPressures(REFERENCE_PRESSURE.SL.kPa)}, that of an XL tire at ${bothPressures(REFERENCE_PRESSURE.XL.kPa)}. At the same pressure, an XL tire carries about what an SL tire does.`,
      ],
    },
    {
      heading: "Replacing XL tires",
      paragraphs: [
        "If the placard calls for XL, fit XL. Replacing a standard-load tire with an XL one is fine, but the pressure must be set so that the tire carries at least the original load: a fitter reads it from the maker's load-and-inflation table.",
      ],
    },
  ],
  standards: [
    { name: "UN Regulation No. 30 (ECE R30)", covers: "how run-flat (RF in the size) and reinforced or extra-load tires are marked" },
    { name: "ETRTO Standards Manual", covers: "the reference pressures of standard-load and extra-load passenger tires" },
    { name: "FMVSS 138 (49 CFR 571.138)", covers: "tire-pressure monitoring systems" },
  ],
  commonPractice: [
    "RF after the service description means reinforced (extra load); RF inside the size means run-flat (common practice).",
    "Do not mix run-flat and ordinary tires on one vehicle (common practice).",
    "After driving a run-flat without air, have it replaced rather than repaired unless its maker says otherwise (common practice).",
  ],
  readerExample: "225/45RF17 94W XL",
  related: ["load-index", "speed-symbols", "load-range"],
  showCautions: true,
};
