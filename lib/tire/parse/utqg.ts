import type { TemperatureGrade, TractionGrade } from "../types";
import { addSpan, endsChunk, glued, numAt, skipPunct, wordAt, type Reader } from "./reader";

export const TRACTION: ReadonlySet<string> = new Set<TractionGrade>(["AA", "A", "B", "C"]);
const TEMPERATURE: ReadonlySet<string> = new Set<TemperatureGrade>(["A", "B", "C"]);

function set<K extends "treadwear" | "traction" | "temperature">(r: Reader, key: K, value: NonNullable<Reader["draft"][K]>, label: string): void {
  const d = r.draft;
  if (d[key] !== null && d[key] !== value) d.warnings.push(`Two ${label} grades are marked (${d[key]} and ${value}); ${d[key]} is used.`);
  d[key] ??= value;
}

/** Traction then temperature grade from the words at k: "AA A", "A A", "AAA", "AB". */
function grades(r: Reader, k: number): { traction: string; temperature: string; next: number } | null {
  const w = wordAt(r, k);
  if (w === undefined || w.length > 3) return null;
  const second = wordAt(r, k + 1);
  if (w.length <= 2 && second?.length === 1 && !glued(r, k + 1)) return { traction: w, temperature: second, next: k + 2 };
  if (w.length === 1) return null;
  return { traction: w.slice(0, -1), temperature: w.slice(-1), next: k + 1 };
}

/** Treadwear number then grades without keywords: "500 A A", "500AA A", "UTQG 500 AA A". */
export function readUtqgGrades(r: Reader, i: number): number {
  const tw = numAt(r, i);
  if (!tw?.plain || tw.text.length < 2 || tw.text.length > 4) return 0;
  const g = grades(r, i + 1);
  if (!g || !TRACTION.has(g.traction) || !TEMPERATURE.has(g.temperature) || !endsChunk(r, g.next)) return 0;
  set(r, "treadwear", tw.value, "treadwear");
  set(r, "traction", g.traction as TractionGrade, "traction");
  set(r, "temperature", g.temperature as TemperatureGrade, "temperature");
  addSpan(r, "utqg", i, g.next);
  return g.next;
}

/** "TREADWEAR 500", "TRACTION AA", "TEMPERATURE A" (or "TEMP A"), in any order; "UTQG" before bare grades. */
export function readUtqgWords(r: Reader, i: number): number {
  const key = wordAt(r, i);
  const j = skipPunct(r, i + 1, ":");
  if (key === "UTQG") {
    const end = readUtqgGrades(r, j);
    if (end > 0) addSpan(r, "utqg", i, i + 1);
    return end;
  }
  if (!endsChunk(r, j + 1)) return 0;
  if (key === "TREADWEAR") {
    const n = numAt(r, j);
    if (!n?.plain) return 0;
    set(r, "treadwear", n.value, "treadwear");
  } else {
    const grade = wordAt(r, j) ?? "";
    if (key === "TRACTION" && TRACTION.has(grade)) set(r, "traction", grade as TractionGrade, "traction");
    else if ((key === "TEMPERATURE" || key === "TEMP") && TEMPERATURE.has(grade)) set(r, "temperature", grade as TemperatureGrade, "temperature");
    else return 0;
  }
  addSpan(r, "utqg", i, j + 1);
  return j + 1;
}
