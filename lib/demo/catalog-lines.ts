import type { Season, Terrain } from "@/db/schema";

/** What a line is made for; it decides the sizes it comes in, its speed ratings and its price. */
export type LineCategory =
  | "touring"
  | "grand-touring"
  | "summer"
  | "winter"
  | "all-weather"
  | "suv-highway"
  | "all-terrain"
  | "mud-terrain"
  | "van"
  | "run-flat"
  | "trailer"
  | "spare";

export interface CategoryTraits {
  season: Season;
  terrain: Terrain;
  mudAndSnow: boolean;
  threePeak: boolean;
  runFlat: boolean;
  /** Treadwear, traction, temperature; null where UTQG does not apply (winter, LT, trailer, spare). */
  utqg: readonly [number, "AA" | "A" | "B", "A" | "B"] | null;
  mileageWarrantyMiles: number | null;
  /** Dollars added to a size's base price. */
  premium: number;
  /** New tread depth in 32nds of an inch (invented, in the usual range for such tires). */
  treadDepth32: number;
}

export const CATEGORY_TRAITS: Record<LineCategory, CategoryTraits> = {
  touring: { season: "all-season", terrain: "highway", mudAndSnow: true, threePeak: false, runFlat: false, utqg: [700, "A", "B"], mileageWarrantyMiles: 70_000, premium: 0, treadDepth32: 10 },
  "grand-touring": { season: "all-season", terrain: "highway", mudAndSnow: true, threePeak: false, runFlat: false, utqg: [540, "A", "A"], mileageWarrantyMiles: 50_000, premium: 18, treadDepth32: 10 },
  summer: { season: "summer", terrain: "highway", mudAndSnow: false, threePeak: false, runFlat: false, utqg: [300, "AA", "A"], mileageWarrantyMiles: null, premium: 28, treadDepth32: 9 },
  winter: { season: "winter", terrain: "highway", mudAndSnow: true, threePeak: true, runFlat: false, utqg: null, mileageWarrantyMiles: null, premium: 22, treadDepth32: 12 },
  "all-weather": { season: "all-weather", terrain: "highway", mudAndSnow: true, threePeak: true, runFlat: false, utqg: [600, "A", "B"], mileageWarrantyMiles: 60_000, premium: 16, treadDepth32: 11 },
  "suv-highway": { season: "all-season", terrain: "highway", mudAndSnow: true, threePeak: false, runFlat: false, utqg: [720, "A", "B"], mileageWarrantyMiles: 70_000, premium: 10, treadDepth32: 11 },
  "all-terrain": { season: "all-season", terrain: "all-terrain", mudAndSnow: true, threePeak: true, runFlat: false, utqg: [600, "A", "B"], mileageWarrantyMiles: 55_000, premium: 32, treadDepth32: 15 },
  "mud-terrain": { season: "all-season", terrain: "mud-terrain", mudAndSnow: true, threePeak: false, runFlat: false, utqg: null, mileageWarrantyMiles: null, premium: 62, treadDepth32: 19 },
  van: { season: "all-season", terrain: "highway", mudAndSnow: true, threePeak: false, runFlat: false, utqg: null, mileageWarrantyMiles: 40_000, premium: 20, treadDepth32: 11 },
  "run-flat": { season: "all-season", terrain: "highway", mudAndSnow: true, threePeak: false, runFlat: true, utqg: [500, "A", "A"], mileageWarrantyMiles: 45_000, premium: 70, treadDepth32: 10 },
  trailer: { season: "all-season", terrain: "highway", mudAndSnow: false, threePeak: false, runFlat: false, utqg: null, mileageWarrantyMiles: null, premium: -8, treadDepth32: 9 },
  spare: { season: "all-season", terrain: "highway", mudAndSnow: false, threePeak: false, runFlat: false, utqg: null, mileageWarrantyMiles: null, premium: -25, treadDepth32: 6 },
};

export interface DemoBrand {
  name: string;
  /** Three letters that start each of the brand's SKUs. */
  skuCode: string;
  /** Price level against the middle of the market. */
  priceFactor: number;
  lines: readonly (readonly [name: string, category: LineCategory])[];
}

/** Invented brands and lines: none of these names is a tire brand or tread pattern on the market. */
export const DEMO_BRANDS: readonly DemoBrand[] = [
  { name: "Velmora", skuCode: "VLM", priceFactor: 1.25, lines: [["Estrelle Tour", "touring"], ["Estrelle GT", "grand-touring"], ["Vessant Sport", "summer"], ["Vessant RF", "run-flat"], ["Norwyn Winter", "winter"]] },
  { name: "Quensal", skuCode: "QNS", priceFactor: 1, lines: [["Aldermoor Tour", "touring"], ["Aldermoor AW", "all-weather"], ["Bexford HT", "suv-highway"], ["Bexford AT", "all-terrain"], ["Caddon MT", "mud-terrain"]] },
  { name: "Ostrigo", skuCode: "OST", priceFactor: 1.05, lines: [["Cendral Tour", "touring"], ["Cendral Sport", "summer"], ["Corrimar Van", "van"], ["Corrimar Winter", "winter"], ["Davellan AT", "all-terrain"]] },
  { name: "Tamberlin", skuCode: "TMB", priceFactor: 1.3, lines: [["Eskwith GT", "grand-touring"], ["Eskwith Sport", "summer"], ["Fennick RF", "run-flat"], ["Ferrow HT", "suv-highway"], ["Galloran Winter", "winter"]] },
  { name: "Corrivan", skuCode: "CRV", priceFactor: 0.95, lines: [["Glenholt Tour", "touring"], ["Glenholt AW", "all-weather"], ["Hessle AT", "all-terrain"], ["Hessle MT", "mud-terrain"], ["Harrowick ST", "trailer"]] },
  { name: "Ashlund", skuCode: "ASH", priceFactor: 0.8, lines: [["Ivelle Tour", "touring"], ["Ivelle Sport", "summer"], ["Jorvane HT", "suv-highway"], ["Jorvane AT", "all-terrain"], ["Keldry Spare", "spare"]] },
  { name: "Pellwick", skuCode: "PWK", priceFactor: 1, lines: [["Larkmoor Tour", "touring"], ["Larkmoor Winter", "winter"], ["Lorrimer AT", "all-terrain"], ["Lorrimer MT", "mud-terrain"], ["Marrick Van", "van"]] },
  { name: "Norvessa", skuCode: "NVS", priceFactor: 1.2, lines: [["Mistrel AW", "all-weather"], ["Mistrel Winter", "winter"], ["Nerrin GT", "grand-touring"], ["Nerrin Sport", "summer"], ["Nethercot HT", "suv-highway"]] },
  { name: "Kaldren", skuCode: "KLD", priceFactor: 0.75, lines: [["Orrick Tour", "touring"], ["Orrick HT", "suv-highway"], ["Ottavel AT", "all-terrain"], ["Ottavel MT", "mud-terrain"], ["Pendlow ST", "trailer"]] },
  { name: "Sablecroft", skuCode: "SBC", priceFactor: 1.1, lines: [["Quenby GT", "grand-touring"], ["Quenby Sport", "summer"], ["Quillon RF", "run-flat"], ["Rathmere AW", "all-weather"], ["Rathmere HT", "suv-highway"]] },
  { name: "Dravik", skuCode: "DRV", priceFactor: 0.85, lines: [["Rostrel Tour", "touring"], ["Rostrel Winter", "winter"], ["Selvane AT", "all-terrain"], ["Selvane MT", "mud-terrain"], ["Stavell Van", "van"]] },
  { name: "Lumeno", skuCode: "LMN", priceFactor: 0.95, lines: [["Tarrin Tour", "touring"], ["Tarrin GT", "grand-touring"], ["Tolland Sport", "summer"], ["Tolland Winter", "winter"], ["Ulverby RF", "run-flat"]] },
  { name: "Wendmark", skuCode: "WDM", priceFactor: 1, lines: [["Umbrel Tour", "touring"], ["Umbrel AW", "all-weather"], ["Vantrell HT", "suv-highway"], ["Vantrell AT", "all-terrain"], ["Wyncote Van", "van"]] },
  { name: "Orlenko", skuCode: "ORL", priceFactor: 0.8, lines: [["Varnock Tour", "touring"], ["Varnock Sport", "summer"], ["Wexmoor AT", "all-terrain"], ["Wexmoor ST", "trailer"], ["Yarrowby Spare", "spare"]] },
];
