import { DEFAULT_WEAR_LIMIT_32, formatOneDecimal, measurableSizeFromSlug, MM_PER_32ND, sizeGeometry, wearMatch } from "@/lib/tire";
import { bothLengths } from "./figures";
import type { Lesson } from "./types";

// Figures come from the tire core on a real standard size. The 1.6 mm (2/32 in) wear bars are
// written from memory of UN Regulation No. 30's tread-wear indicators; the 2/32 in limit between
// tires and "two new tires go on the rear" are common practice, and the vehicle maker's figure rules.
const size = measurableSizeFromSlug("225/65R17");
if (!size) throw new Error("The example size 225/65R17 no longer reads");
const newDiameter = sizeGeometry(size).overallDiameterMm;
const example = wearMatch({ newDiameterMm: newDiameter, newDepth32: 10, remaining32: [6, 6, 7], limit: { kind: "depth32", value: DEFAULT_WEAR_LIMIT_32 } });
const [worn] = example.remaining;
if (!worn) throw new Error("The worked example lost its staying tires");
const circumferenceGap = example.newTire.circumferenceMm - worn.circumferenceMm;

export const treadDepthLesson: Lesson = {
  slug: "tread-depth",
  title: "Tread depth and all-wheel drive",
  shortTitle: "Tread depth and AWD",
  summary: "How to measure what is left of the tread, and why an all-wheel-drive vehicle wants its four tires worn alike.",
  sample: "6/32 in",
  sections: [
    {
      heading: "Measuring what is left",
      paragraphs: [
        "Tread depth is measured from the top of the tread to the bottom of a main groove, in 32nds of an inch or in millimetres: 1/32 in is 0.79375 mm.",
        "Use a tread-depth gauge, not a coin: press its foot into a main groove, away from the small raised wear bars, and read the scale. Measure the inner, middle and outer grooves, at two or three places around the tire, and take the lowest reading: a tire wears unevenly, and the shallowest spot is the one that counts.",
        "The wear bars across the grooves stand 1.6 mm (2/32 in) high. When the tread is level with them, the tire is worn out, whatever else this page says.",
      ],
    },
    {
      heading: "Why all-wheel drive cares",
      paragraphs: [
        `A worn tire is a smaller tire. Worn from 10/32 to 6/32 in, a 225/65R17 has lost ${formatOneDecimal(4 * MM_PER_32ND)} mm of tread on each side: its diameter drops from ${bothLengths(newDiameter)} to ${bothLengths(worn.overallDiameterMm)}, and each turn covers ${formatOneDecimal(circumferenceGap)} mm less road than a new one.`,
        "On an all-wheel-drive vehicle the front and rear axles are linked. A smaller tire must turn faster to keep up, and the parts that let the axles turn at different speeds in bends — a centre differential, a coupling, clutch packs — then slip all the time on a straight road. They heat up and wear, sometimes expensively.",
        "So one new tire beside three worn ones may not be allowed. Shops either replace tires in pairs or as a set, or shave the new tire down on a tire lathe until its depth matches the others.",
      ],
    },
    {
      heading: "What the limits mean",
      paragraphs: [
        `Vehicle makers state how far apart the tires may be, either as a difference of tread depth (often 2/32 to 4/32 in) or as a difference of rolling circumference (a number of millimetres or inches). Every tire must be within that limit of every other. Here the shop's default is ${DEFAULT_WEAR_LIMIT_32}/32 in.`,
        "Makers differ because their drivetrains differ: a system that only sends power to the rear when the front slips tolerates more than one whose axles are always locked together.",
        `In the example above, the staying tires read 6, 6 and 7/32 in. A new 10/32 in tire is more than ${DEFAULT_WEAR_LIMIT_32}/32 in deeper than the shallowest, so it would be shaved to ${example.shaveTo32}/32 in. Had the staying tires read 5 and 8/32 in, they would already be too far apart: no single new tire could fix that, and the set would be replaced.`,
        "Two new tires usually go on the rear axle, so the deeper tread is where a skid would start (common practice).",
        "Follow the limit in the vehicle maker's handbook, and have a qualified fitter measure the tires and do any shaving: a figure on a screen is no substitute for a gauge in the groove.",
      ],
    },
  ],
  standards: [{ name: "UN Regulation No. 30 (from memory)", covers: "tread-wear indicators 1.6 mm high in the main grooves" }],
  commonPractice: [
    `A limit of ${DEFAULT_WEAR_LIMIT_32}/32 in between any two tires when the vehicle maker states none (common practice); the maker's own figure always comes first.`,
    "Measure several grooves at several places and take the lowest reading (common practice).",
    "Two new tires go on the rear axle (common practice).",
  ],
  readerExample: "225/65R17 102H",
  related: ["overall-diameter", "load-index", "speed-symbols"],
  showCautions: true,
};
