import {
  formatLength,
  formatOneDecimal,
  formatSignedPercent,
  IMPLIED_ASPECT_RATIO,
  measurableSizeFromSlug,
  mmToIn,
  sizeGeometry,
  type Geometry,
} from "@/lib/tire";
import { diameterChangePct, trueSpeed } from "@/lib/tire/diameter-change";
import { bothLengths, bothSpeeds } from "./figures";
import type { Lesson } from "./types";

// Every figure is computed by the tire core from real standard sizes. UN R39 §5.3 (a speedometer
// never shows less than the true speed) and the effects on ABS and stability control are written
// from memory; "about 3 %" is the usual fitter's limit (common practice).
function geometryOf(designation: string): Geometry {
  const size = measurableSizeFromSlug(designation);
  if (!size) throw new Error(`The example size ${designation} no longer reads`);
  return sizeGeometry(size);
}

const worked = geometryOf("285/50R20");
const flotation = geometryOf("33x12.50R15LT");
const plusFrom = geometryOf("225/65R17");
const plusTo = geometryOf("225/60R18");
const stockSize = geometryOf("265/70R17");
const tallerSize = geometryOf("285/70R17");
const change = (from: Geometry, to: Geometry) => formatSignedPercent(diameterChangePct(from.overallDiameterMm, to.overallDiameterMm));
const trueKmh = (shownKmh: number) => trueSpeed(shownKmh, stockSize.overallDiameterMm, tallerSize.overallDiameterMm);

export const overallDiameterLesson: Lesson = {
  slug: "overall-diameter",
  title: "Overall diameter, aspect ratio and the speedometer",
  shortTitle: "Diameter and speedometer",
  summary: "How a size's numbers give the tire's height, and why a taller or shorter tire changes what the speedometer shows.",
  sample: "285/50R20",
  sections: [
    {
      heading: "From the size to the height",
      paragraphs: [
        "A metric size such as 285/50R20 gives three numbers: the section width in millimetres (285), the aspect ratio (50) and the rim diameter in inches (20).",
        `The aspect ratio is the sidewall's height as a percentage of the width. Here the sidewall is 50 % of 285 mm, ${formatOneDecimal(worked.sidewallMm)} mm (${formatOneDecimal(mmToIn(worked.sidewallMm))} in). The overall diameter is the rim plus two sidewalls, one above the wheel and one below: ${formatLength(worked.rimDiameterMm, "metric")} + 2 × ${formatOneDecimal(worked.sidewallMm)} mm = ${bothLengths(worked.overallDiameterMm)}.`,
        `Flotation sizes such as 33x12.50R15LT state the diameter outright: 33 inches, ${bothLengths(flotation.overallDiameterMm)}. A size marked with no aspect ratio, such as 155R13, belongs to the ${IMPLIED_ASPECT_RATIO} series.`,
        "These are nominal figures for a new tire, unloaded. Real tires differ a little from maker to maker and shrink slightly under the car's weight.",
      ],
    },
    {
      heading: "Bigger wheels, same height",
      paragraphs: [
        `Plus sizing fits a larger wheel and a lower aspect ratio so that the overall diameter barely changes. 225/65R17 is ${bothLengths(plusFrom.overallDiameterMm)} tall; 225/60R18 on an 18-inch wheel is ${bothLengths(plusTo.overallDiameterMm)}, a change of ${change(plusFrom, plusTo)}.`,
        "A different wheel needs the right width, offset, bolt pattern and load rating too, and a lower-profile tire may need a higher load index to carry the same weight.",
      ],
    },
    {
      heading: "Why the speedometer changes",
      paragraphs: [
        "A speedometer does not measure speed directly. It counts how often the wheels turn and assumes each turn covers the distance of the tire the car left the factory with.",
        `Fit a taller tire and each turn covers more road, so the car goes faster than it shows. Going from 265/70R17 (${bothLengths(stockSize.overallDiameterMm)}) to 285/70R17 (${bothLengths(tallerSize.overallDiameterMm)}) is a change of ${change(stockSize, tallerSize)}: when the speedometer shows ${bothSpeeds(100)}, the car really does about ${bothSpeeds(trueKmh(100))}.`,
        "The rules for new vehicles say a speedometer must never show less than the true speed, so most read slightly high from the factory. A taller tire eats into that margin and can leave the speedometer reading below the true speed; a shorter tire makes it read higher still, and the odometer count more distance than was driven.",
      ],
    },
    {
      heading: "What else notices",
      paragraphs: [
        "Anti-lock brakes, stability control and, on four-wheel-drive vehicles, the drivetrain compare wheel speeds with one another. Keep all four tires the same size and similarly worn, or these systems may step in when they should not.",
        "A taller or wider tire may also touch the wheel arch, the suspension or the brake lines at full steering lock or when the suspension compresses, and it changes the gearing the engine feels.",
      ],
    },
  ],
  standards: [
    { name: "ISO 4000-1 and the ETRTO Standards Manual", covers: "the size designation: section width, aspect ratio and rim diameter" },
    { name: "UN Regulation No. 39, §5.3", covers: "a speedometer never shows less than the true speed" },
  ],
  commonPractice: [
    "Many fitters keep a replacement's overall diameter within about 3 % of the original's (common practice); the vehicle maker's approved sizes come first.",
    "When in doubt between a slightly taller and a slightly shorter size, a slightly shorter one keeps the speedometer at or above the true speed (common practice).",
  ],
  readerExample: "265/70R17",
  related: ["load-index", "speed-symbols", "run-flat-and-xl"],
  showCautions: true,
};
