import type { TemperatureGrade, TractionGrade } from "../types";
import { addSpan, endOf, endsChunk, glued, numAt, skipPunct, startOf, wordAt, type Draft, type Reader } from "./reader";

export const TRACTION: ReadonlySet<string> = new Set<TractionGrade>(["AA", "A", "B", "C"]);
export const TEMPERATURE: ReadonlySet<string> = new Set<TemperatureGrade>(["A", "B", "C"]);

const conflict = (label: string, kept: number | string, value: number | string): string =>
  `Two ${label} grades are marked (${kept} and ${value}); ${kept} is used.`;

// One setter per grade, each keeping the first one marked, rather than one taking the field's name:
// reading and writing the draft by a computed key took about a fifth of the time of reading "500 A A".
function setTreadwear(d: Draft, value: number): void {
  if (d.treadwear === null) d.treadwear = value;
  else if (d.treadwear !== value) d.warnings.push(conflict("treadwear", d.treadwear, value));
}

function setTraction(d: Draft, grade: TractionGrade): void {
  if (d.traction === null) d.traction = grade;
  else if (d.traction !== grade) d.warnings.push(conflict("traction", d.traction, grade));
}

function setTemperature(d: Draft, grade: TemperatureGrade): void {
  if (d.temperature === null) d.temperature = grade;
  else if (d.temperature !== grade) d.warnings.push(conflict("temperature", d.temperature, grade));
}

/** Records the three grades written together in [start, end): "500 A A", "500AA A". */
export function recordGrades(d: Draft, treadwear: number, traction: TractionGrade, temperature: TemperatureGrade, start: number, end: number): void {
  setTreadwear(d, treadwear);
  setTraction(d, traction);
  setTemperature(d, temperature);
  d.spans.push({ part: "utqg", start, end });
}

/** Records one grade after its word, in [start, end): "TREADWEAR 500", "TRACTION A", "TEMP B". */
export function recordTreadwear(d: Draft, value: number, start: number, end: number): void {
  setTreadwear(d, value);
  d.spans.push({ part: "utqg", start, end });
}

export function recordTraction(d: Draft, grade: TractionGrade, start: number, end: number): void {
  setTraction(d, grade);
  d.spans.push({ part: "utqg", start, end });
}

export function recordTemperature(d: Draft, grade: TemperatureGrade, start: number, end: number): void {
  setTemperature(d, grade);
  d.spans.push({ part: "utqg", start, end });
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
  recordGrades(r.draft, tw.value, g.traction as TractionGrade, g.temperature as TemperatureGrade, startOf(r, i), endOf(r, g.next));
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
  const start = startOf(r, i);
  if (key === "TREADWEAR") {
    const n = numAt(r, j);
    if (!n?.plain) return 0;
    recordTreadwear(r.draft, n.value, start, endOf(r, j + 1));
  } else {
    const grade = wordAt(r, j) ?? "";
    if (key === "TRACTION" && TRACTION.has(grade)) recordTraction(r.draft, grade as TractionGrade, start, endOf(r, j + 1));
    else if ((key === "TEMPERATURE" || key === "TEMP") && TEMPERATURE.has(grade)) recordTemperature(r.draft, grade as TemperatureGrade, start, endOf(r, j + 1));
    else return 0;
  }
  return j + 1;
}
