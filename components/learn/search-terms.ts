/**
 * Reading what a person types into a table's search box: an amount with an optional unit
 * ("1360", "1,360 kg", "130 mph"), or a service description as printed on the sidewall ("119S").
 */

export interface Amount<Unit extends string> {
  value: number;
  /** Null when no unit was typed. */
  unit: Unit | null;
}

const AMOUNT = /^(\d+(?:\.\d+)?)\s*([a-z/#]*)$/i;
const SERVICE = /^(\d{1,3})(?:\/\d{1,3})?\s*(\(Y\)|[A-Z]\d?)$/i;

/** Trimmed, with thousands separators removed: " 1,360 kg " → "1360 kg". */
function normalizeQuery(query: string): string {
  return query.trim().replace(/(\d),(?=\d{3}(?!\d))/g, "$1");
}

/** An amount whose unit, if any, is one of `unitWords` (each spelling mapped to its unit). */
export function readAmount<Unit extends string>(query: string, unitWords: Readonly<Record<string, Unit>>): Amount<Unit> | null {
  const match = AMOUNT.exec(normalizeQuery(query));
  if (!match) return null;
  const value = Number(match[1]);
  const word = (match[2] ?? "").toLowerCase();
  if (!word) return { value, unit: null };
  const unit = unitWords[word];
  return unit === undefined ? null : { value, unit };
}

/** The load index and speed symbol of a service description such as "119S" or "123/120 S". */
export function readServiceDescription(query: string): { loadIndex: number; speedSymbol: string } | null {
  const match = SERVICE.exec(normalizeQuery(query));
  if (!match?.[1] || !match[2]) return null;
  return { loadIndex: Number(match[1]), speedSymbol: match[2].toUpperCase() };
}

/** What a table search found: the keys of the matching rows (null: every row), notes, row tags. */
export interface SearchOutcome {
  keys: ReadonlySet<string> | null;
  /** Plain-words answers to the question behind the search, read out with the row count. */
  notes: readonly string[];
  /** A short tag shown on a row, such as "lowest for 1,360 kg". */
  tags: ReadonlyMap<string, string>;
}

export const everyRow: SearchOutcome = { keys: null, notes: [], tags: new Map() };
export const noRow: SearchOutcome = { keys: new Set(), notes: [], tags: new Map() };
