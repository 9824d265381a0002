import type { SidewallPartKey, TireSize } from "@/lib/tire";
import { rimTwinCaution } from "@/lib/tire/rim-twins";

/**
 * Plain-words explanations of each part of a sidewall marking, in our own words.
 * Shared by the Sidewall reader, the Size sheet and Sidewall school.
 */
export interface PartExplanation {
  title: string;
  /** One or two sentences a driver can read standing next to the car. */
  summary: string;
  /** The Sidewall school topic that goes deeper, when there is one. */
  learnTopic?: string;
}

export const sidewallParts: Record<SidewallPartKey, PartExplanation> = {
  prefix: {
    title: "Service type",
    summary:
      "A letter before the size says what the tire is built for: P for passenger cars, LT for light trucks that carry heavy loads, ST for trailers only, T for a temporary spare. No letter usually means a metric passenger tire.",
  },
  overallDiameter: {
    title: "Overall diameter",
    summary:
      "On a flotation size such as 33x12.50R15LT, the first number is the tire's overall diameter in inches: how tall it stands, not how wide it is. The width follows the x, also in inches, then the rim diameter.",
    learnTopic: "overall-diameter",
  },
  sectionWidth: {
    title: "Section width",
    summary:
      "How wide the tire is from sidewall to sidewall, in millimetres, measured inflated on its measuring rim. Wider is not automatically better: it must fit the wheel and the wheel well.",
  },
  aspectRatio: {
    title: "Aspect ratio",
    summary:
      "The sidewall height as a percentage of the section width. A lower number means a shorter, stiffer sidewall; a higher number a taller, softer one.",
    learnTopic: "overall-diameter",
  },
  construction: {
    title: "Construction",
    summary:
      "R means radial: the cords run straight across from bead to bead. Almost every car tire today is radial. D or a dash means bias (diagonal) ply, B means bias-belted; never mix radial and bias tires on one axle.",
  },
  rimDiameter: {
    title: "Rim diameter",
    summary:
      "The wheel diameter the tire is made for, in inches. It is never negotiable: a tire mounts only on a wheel of exactly this size, so a replacement must have the same number.",
  },
  commercial: {
    title: "Commercial (C)",
    summary:
      "A C right after the rim diameter marks a commercial tire for vans and light trucks, built for higher loads and pressures. Replace it with another C tire.",
  },
  loadIndex: {
    title: "Load index",
    summary:
      "A code for the most weight one tire may carry at its rated pressure. Never fit a lower load index than the vehicle's placard specifies. Two numbers (like 123/120) give the load for single and for dual wheels. Passenger tires have one number only: they carry no dual rating and do not belong on dual wheels.",
    learnTopic: "load-index",
  },
  speedSymbol: {
    title: "Speed symbol",
    summary:
      "The highest speed the tire is built to sustain under its load. Letters are not in alphabetical order of speed: H (210 km/h) sits between U and V. Never fit a lower speed rating than specified.",
    learnTopic: "speed-symbols",
  },
  loadRange: {
    title: "Load range",
    summary:
      "On light-truck and trailer (ST) tires, a letter for how strong the carcass is and how much pressure it may hold: C, D, E and up. A replacement needs the same load range or higher.",
    learnTopic: "load-range",
  },
  plyRating: {
    title: "Ply rating",
    summary:
      "An older way of stating strength, as if the tire were made of that many cotton plies. Today it is a strength class, not a count: a 10-ply rating is load range E.",
    learnTopic: "load-range",
  },
  extraLoad: {
    title: "Extra Load (XL)",
    summary:
      "A reinforced passenger tire that carries more at a higher pressure than a standard-load (SL) tire of the same size. Its higher load is available only at its higher pressure.",
    learnTopic: "run-flat-and-xl",
  },
  runFlat: {
    title: "Run-flat",
    summary:
      "A tire that can carry the car a limited distance at reduced speed after losing pressure. Cars built for run-flats often have no spare, so replace run-flats with run-flats.",
    learnTopic: "run-flat-and-xl",
  },
  dot: {
    title: "DOT code (TIN)",
    summary:
      "The tire identification number: the plant that made it, then size and maker's codes, and last a four-digit date code, week then year. 3208 means the 32nd week of 2008.",
    learnTopic: "dot-code",
  },
  utqg: {
    title: "UTQG grades",
    summary:
      "US grades for treadwear (a number compared with a reference tire), traction on wet pavement (AA, A, B, C) and resistance to heat (A, B, C). They compare tires of the same maker best.",
    learnTopic: "utqg",
  },
  winter: {
    title: "Winter marks",
    summary:
      "M+S means the tread was designed for mud and snow. The three-peak mountain snowflake (3PMSF) means the tire passed a standard snow traction test, which M+S alone does not promise.",
    learnTopic: "winter-marks",
  },
  maxLoad: {
    title: "Maximum load",
    summary: "The most weight one tire may carry, printed in kilograms and pounds. It should match the load index.",
    learnTopic: "load-index",
  },
  maxPressure: {
    title: "Maximum pressure",
    summary:
      "The highest cold pressure the tire itself may hold. It is not the pressure to drive at: use the pressure on your vehicle's placard.",
  },
};

const INCH_WIDTH_SUMMARY =
  "This size marks the section width in inches, not millimetres: the 12.50 of 33x12.50R15LT is 12.5 inches (about 318 mm), the 7.50 of 7.50R16 is 7.5 inches. It is measured from sidewall to sidewall on the tire's measuring rim.";

const INCH_COMMERCIAL_SUMMARY =
  "A size with its width in inches and no aspect ratio, such as 11R22.5 or 7.50-16, is made for trucks and other commercial vehicles. Replace it with a tire of the same kind, as the vehicle and tire makers specify.";

/** The explanation of one part of a given size: inch widths and rim diameters that have a half-inch twin say so. */
export function explainPart(key: SidewallPartKey, size: TireSize | null): PartExplanation {
  const explanation = sidewallParts[key];
  if (size === null) return explanation;
  if (key === "sectionWidth" && size.kind !== "metric") return { ...explanation, summary: INCH_WIDTH_SUMMARY };
  if (key === "commercial" && size.kind !== "metric") return { ...explanation, title: "Truck or commercial", summary: INCH_COMMERCIAL_SUMMARY };
  const rimCaution = key === "rimDiameter" ? rimTwinCaution(size.rimDiameterIn) : null;
  return rimCaution === null ? explanation : { ...explanation, summary: `${explanation.summary} ${rimCaution}` };
}

/** "More about …" in running text: lower case, but abbreviations keep their capitals (DOT, TIN, UTQG, XL). */
export function moreAboutLabel(title: string): string {
  const words = title.split(" ").map((word) => (/^\(?[A-Z0-9]+\)?$/.test(word) ? word : word.toLowerCase()));
  return `More about ${words.join(" ")}`;
}
