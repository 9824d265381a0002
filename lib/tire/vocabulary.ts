/** Words the catalog, the finder and the forms share; browser-safe, so every layer may import them. */

export const SEASONS = ["all-season", "all-weather", "summer", "winter"] as const;
export type Season = (typeof SEASONS)[number];

export const TERRAINS = ["highway", "all-terrain", "mud-terrain"] as const;
export type Terrain = (typeof TERRAINS)[number];
