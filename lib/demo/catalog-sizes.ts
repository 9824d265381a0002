import type { LineCategory } from "./catalog-lines";

/** Which lines a size is made in. */
export type SizeGroup = "car" | "suv" | "lt" | "flotation" | "van" | "trailer" | "spare" | "run-flat";

export type LoadRangeOption = readonly [range: "C" | "D" | "E", single: number, dual: number | null];

export interface SizeOffer {
  designation: string;
  group: SizeGroup;
  /** How much of the stock this size gets, 1 (rare) to 5 (the sizes people drive most). */
  popularity: number;
  /** Passenger sizes: standard load and extra load indices, and the P-metric index where the size is also sold as P-metric. */
  standardLoad?: number;
  extraLoad?: number;
  pMetric?: number;
  /** Light-truck, trailer, flotation and commercial sizes: [load range, single, dual]. */
  loadRanges?: readonly LoadRangeOption[];
  /** Commercial (C) and spare sizes: single and dual index. */
  service?: readonly [single: number, dual: number | null];
}

const car = (designation: string, popularity: number, standardLoad: number, extraLoad?: number): SizeOffer => ({ designation, group: "car", popularity, standardLoad, extraLoad });
const suv = (designation: string, popularity: number, standardLoad: number, extraLoad?: number, pMetric?: number): SizeOffer => ({ designation, group: "suv", popularity, standardLoad, extraLoad, pMetric });
const lt = (designation: string, popularity: number, ...loadRanges: LoadRangeOption[]): SizeOffer => ({ designation, group: "lt", popularity, loadRanges });
const flotation = (designation: string, popularity: number, ...loadRanges: LoadRangeOption[]): SizeOffer => ({ designation, group: "flotation", popularity, loadRanges });
const van = (designation: string, popularity: number, single: number, dual: number): SizeOffer => ({ designation, group: "van", popularity, service: [single, dual] });
const trailer = (designation: string, popularity: number, ...loadRanges: LoadRangeOption[]): SizeOffer => ({ designation, group: "trailer", popularity, loadRanges });
const spare = (designation: string, single: number): SizeOffer => ({ designation, group: "spare", popularity: 1, service: [single, null] });
const runFlat = (designation: string, popularity: number, standardLoad: number, extraLoad: number): SizeOffer => ({ designation, group: "run-flat", popularity, standardLoad, extraLoad });

/**
 * Real standard sizes with load indices typical of each (from memory of common fitments; the demo's
 * prices and stock are invented).
 */
export const SIZE_OFFERS: readonly SizeOffer[] = [
  car("175/65R14", 2, 82, 86), car("185/70R14", 1, 88), car("185/65R15", 3, 88, 92), car("195/65R15", 4, 91, 95),
  car("185/60R15", 2, 84, 88), car("195/60R15", 2, 88, 92), car("205/65R15", 2, 94, 99), car("205/55R16", 5, 91, 94),
  car("205/60R16", 3, 92, 96), car("215/55R16", 2, 93, 97), car("215/60R16", 4, 95, 99), car("225/60R16", 3, 98, 102),
  car("205/50R17", 2, 89, 93), car("215/45R17", 2, 87, 91), car("215/50R17", 2, 91, 95), car("215/55R17", 4, 94, 98),
  car("225/45R17", 5, 91, 94), car("225/50R17", 4, 94, 98), car("225/55R17", 3, 97, 101), car("235/45R17", 2, 94, 97),
  car("225/40R18", 3, 88, 92), car("235/40R18", 2, 91, 95), car("235/45R18", 3, 94, 98), car("245/40R18", 3, 93, 97),
  car("245/45R18", 3, 96, 100), car("225/55R18", 2, 98, 102), car("235/50R18", 2, 97, 101), car("255/35R19", 2, 92, 96),
  car("245/40R19", 2, 94, 98), car("245/45R19", 2, 98, 102), car("255/40R19", 2, 96, 100), car("245/35R20", 1, 91, 95),
  car("255/45R20", 1, 101, 105), car("275/40R20", 1, 102, 106),
  suv("215/65R16", 3, 98, 102), suv("215/70R16", 2, 100), suv("225/65R17", 4, 102, 106, 100), suv("225/60R17", 3, 99, 103),
  suv("235/65R17", 5, 104, 108, 103), suv("235/60R18", 3, 103, 107), suv("235/55R19", 2, 101, 105), suv("235/75R15", 2, 105, 109, 105),
  suv("245/60R18", 2, 105, 109), suv("245/65R17", 2, 107, 111, 105), suv("245/75R16", 2, 111, 114, 109), suv("255/55R18", 2, 105, 109),
  suv("255/60R18", 1, 108, 112), suv("255/65R18", 1, 111, undefined, 109), suv("255/70R18", 2, 113, 116), suv("265/60R18", 3, 110, 114),
  suv("265/65R17", 3, 112, 116, 110), suv("265/65R18", 2, 114), suv("265/70R16", 2, 112, undefined, 111), suv("265/70R17", 5, 115, 119, 113),
  suv("265/50R20", 1, 107, 111), suv("265/55R20", 1, 109, 113), suv("275/55R20", 5, 113, 117, 111), suv("275/60R20", 3, 115, 119, 114),
  suv("275/65R18", 3, 116, 120, 114), suv("275/50R22", 1, 111, 115), suv("285/45R22", 1, 110, 114), suv("285/50R20", 5, 112, 116),
  suv("295/45R20", 1, 110, 114), suv("305/50R20", 1, 116, 120), suv("285/70R17", 2, 117, 121),
  lt("LT225/75R16", 2, ["D", 110, 107], ["E", 115, 112]), lt("LT235/75R15", 1, ["C", 104, 101]), lt("LT235/80R17", 1, ["E", 120, 117]),
  lt("LT245/70R17", 1, ["E", 119, 116]), lt("LT245/75R16", 3, ["C", 109, 105], ["E", 120, 116]), lt("LT245/75R17", 2, ["E", 121, 118]),
  lt("LT265/70R17", 4, ["C", 112, 109], ["D", 118, 115], ["E", 121, 118]),
  lt("LT265/75R16", 5, ["C", 114, 111], ["D", 120, 116], ["E", 123, 120]),
  lt("LT275/65R18", 3, ["C", 116, 113], ["E", 123, 120]), lt("LT275/70R18", 3, ["E", 125, 122]),
  lt("LT285/70R17", 3, ["C", 116, 113], ["E", 121, 118]), lt("LT285/75R16", 2, ["D", 122, 119], ["E", 126, 123]),
  lt("LT265/70R18", 1, ["E", 124, 121]), lt("LT285/65R18", 2, ["E", 125, 122]), lt("LT275/65R20", 2, ["E", 126, 123]),
  lt("LT285/60R20", 2, ["E", 125, 122]), lt("LT285/55R20", 2, ["E", 122, 119]), lt("LT295/70R18", 1, ["E", 129, 126]),
  lt("LT305/55R20", 1, ["E", 125, 122]), lt("LT265/60R20", 1, ["E", 121, 118]),
  flotation("30x9.50R15LT", 1, ["C", 104, null]), flotation("31x10.50R15LT", 2, ["C", 109, null]), flotation("33x12.50R15LT", 2, ["C", 108, null]),
  flotation("33x12.50R17LT", 1, ["D", 114, null]), flotation("33x12.50R18LT", 1, ["E", 118, null]), flotation("33x12.50R20LT", 2, ["E", 119, null]),
  flotation("35x12.50R17LT", 2, ["E", 121, null]), flotation("35x12.50R18LT", 1, ["E", 123, null]), flotation("35x12.50R20LT", 2, ["E", 121, null]),
  flotation("37x12.50R17LT", 1, ["D", 124, null]),
  van("195/75R16C", 1, 107, 105), van("205/65R16C", 1, 107, 105), van("215/65R16C", 2, 109, 107), van("215/70R15C", 1, 109, 107),
  van("225/65R16C", 2, 112, 110), van("225/70R15C", 1, 112, 110), van("225/75R16C", 1, 121, 120), van("235/65R16C", 2, 115, 113),
  van("235/60R17C", 1, 117, 115),
  trailer("ST205/75R15", 1, ["C", 101, 97], ["D", 107, 103]), trailer("ST225/75R15", 2, ["D", 113, 108], ["E", 117, 112]),
  trailer("ST235/80R16", 1, ["E", 124, 120]),
  spare("T125/70R17", 98), spare("T135/70R16", 100), spare("T125/80R16", 97),
  runFlat("205/55RF16", 1, 91, 94), runFlat("225/45RF17", 2, 91, 94), runFlat("225/50RF17", 1, 94, 98), runFlat("245/40RF18", 2, 93, 97),
  runFlat("245/45RF18", 1, 96, 100), runFlat("225/55RF17", 1, 97, 101), runFlat("255/50RF19", 1, 103, 107), runFlat("275/40RF19", 1, 101, 105),
];

/** The size groups each line category is made in. */
export const GROUPS_BY_CATEGORY: Record<LineCategory, readonly SizeGroup[]> = {
  touring: ["car", "suv"],
  "grand-touring": ["car"],
  summer: ["car"],
  winter: ["car", "suv"],
  "all-weather": ["car", "suv"],
  "suv-highway": ["suv", "lt"],
  "all-terrain": ["suv", "lt", "flotation"],
  "mud-terrain": ["lt", "flotation"],
  van: ["van"],
  "run-flat": ["run-flat"],
  trailer: ["trailer"],
  spare: ["spare"],
};

/** Speed symbols a category is rated for, in each size group it is made in. */
export function speedSymbolsFor(category: LineCategory, group: SizeGroup): readonly string[] {
  if (group === "lt" || group === "flotation") return category === "mud-terrain" ? ["Q", "R"] : category === "all-terrain" ? ["Q", "R", "S", "T"] : ["R", "S", "T"];
  switch (category) {
    case "touring":
      return group === "car" ? ["T", "H", "V"] : ["S", "T", "H"];
    case "grand-touring":
      return ["H", "V", "W"];
    case "summer":
      return ["V", "W", "Y", "(Y)"];
    case "winter":
      return group === "car" ? ["T", "H", "V"] : ["S", "T", "H"];
    case "all-weather":
      return ["T", "H", "V"];
    case "suv-highway":
      return ["T", "H", "V"];
    case "all-terrain":
      return ["S", "T", "H"];
    case "van":
      return ["R", "S", "T", "H"];
    case "run-flat":
      return ["H", "V", "W", "Y"];
    case "trailer":
      return ["L", "M", "N"];
    default:
      return ["M"];
  }
}
