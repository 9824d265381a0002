import { formatLoad } from "@/lib/tire/display";
import { LOAD_INDEX_MAX, LOAD_INDEX_MIN, loadIndexKg, minimumLoadIndex } from "@/lib/tire/load-index";
import { lbToKg } from "@/lib/tire/units";
import { everyRow, noRow, readAmount, readServiceDescription, type SearchOutcome } from "./search-terms";

export interface LoadIndexRow {
  key: string;
  index: number;
  kg: number;
}

/** Every load index of the table, 0–279, with its load in kilograms. */
export const loadIndexRows: readonly LoadIndexRow[] = Array.from({ length: LOAD_INDEX_MAX - LOAD_INDEX_MIN + 1 }, (_, offset) => {
  const index = LOAD_INDEX_MIN + offset;
  return { key: String(index), index, kg: loadIndexKg(index) ?? Number.NaN };
});

/** The anchor of a load index's row on the lesson: /learn/load-index#load-index-150. */
export const loadIndexAnchor = (index: number): string => `load-index-${index}`;

type WeightUnit = "kg" | "lb";
const weightWords: Record<string, WeightUnit> = {
  kg: "kg", kgs: "kg", kilo: "kg", kilos: "kg", kilogram: "kg", kilograms: "kg",
  lb: "lb", lbs: "lb", "#": "lb", pound: "lb", pounds: "lb",
};

const isLoadIndex = (value: number) => Number.isInteger(value) && value >= LOAD_INDEX_MIN && value <= LOAD_INDEX_MAX;
const onlyIndex = (index: number): SearchOutcome => ({ keys: new Set([String(index)]), notes: [], tags: new Map() });

/**
 * Finds rows for what was typed: a load index ("119"), a service description ("119S"), or a
 * weight per tire ("1360", "1360 kg", "2998 lb"). A weight shows the lowest index able to carry
 * it and the one just below; a bare number above the table's last index is read as kg and as lb.
 */
export function searchLoadIndices(query: string): SearchOutcome {
  if (!query.trim()) return everyRow;
  const service = readServiceDescription(query);
  if (service) return isLoadIndex(service.loadIndex) ? onlyIndex(service.loadIndex) : noRow;
  const amount = readAmount(query, weightWords);
  if (!amount) return noRow;
  if (amount.unit === null && isLoadIndex(amount.value)) return onlyIndex(amount.value);
  const units: readonly WeightUnit[] = amount.unit ? [amount.unit] : ["kg", "lb"];
  const keys = new Set<string>();
  const notes: string[] = [];
  const tags = new Map<string, string>();
  for (const unit of units) {
    const kg = unit === "kg" ? amount.value : lbToKg(amount.value);
    const weight = formatLoad(kg, unit === "kg" ? "metric" : "imperial");
    const lowest = minimumLoadIndex(kg);
    if (lowest === undefined) {
      keys.add(String(LOAD_INDEX_MAX));
      notes.push(`No load index carries ${weight} per tire: the table ends at ${LOAD_INDEX_MAX}.`);
      continue;
    }
    if (lowest > LOAD_INDEX_MIN) keys.add(String(lowest - 1));
    keys.add(String(lowest));
    tags.set(String(lowest), `lowest for ${weight}`);
    notes.push(`${weight} per tire needs load index ${lowest} or higher.`);
  }
  return { keys, notes, tags };
}
