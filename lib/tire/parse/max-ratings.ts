import type { LoadMark, PressureMark } from "../types";
import { addSpan, numAt, punctAt, skipPunct, wordAt, type Reader } from "./reader";

type LoadUnit = keyof LoadMark;
type PressureUnit = keyof PressureMark;

const LOAD_UNITS = new Map<string, LoadUnit>([["KG", "kg"], ["KGS", "kg"], ["LB", "lb"], ["LBS", "lb"]]);
const PRESSURE_UNITS = new Map<string, PressureUnit | "bar">([["KPA", "kPa"], ["PSI", "psi"], ["BAR", "bar"]]);
const PRESSURE_WORDS = new Set(["PRESS", "PRESSURE", "INFLATION", "INFL"]);
const MAX_WORDS = new Set(["MAX", "MAXIMUM"]);

/** "MAX. PRESS.", "MAX PRESSURE", "MAXIMUM INFLATION PRESSURE" at token j: the index after it, or 0. */
function maxPressureLabel(r: Reader, j: number): number {
  if (!MAX_WORDS.has(wordAt(r, j) ?? "")) return 0;
  let k = skipPunct(r, j + 1, ".");
  if (!PRESSURE_WORDS.has(wordAt(r, k) ?? "")) return 0;
  k = skipPunct(r, k + 1, ".");
  return PRESSURE_WORDS.has(wordAt(r, k) ?? "") ? skipPunct(r, k + 1, ".") : k;
}

/** One number and its unit at token k, stored in `values`; the index after it, or 0. */
function quantity<U extends string>(r: Reader, k: number, units: ReadonlyMap<string, U>, values: Map<U, number>): number {
  const n = numAt(r, k);
  const unit = units.get(wordAt(r, k + 1) ?? "");
  if (!n || unit === undefined) return 0;
  values.set(unit, n.value);
  return k + 2;
}

/** "1360 KG (2998 LBS)": a quantity, optionally repeated in another unit in brackets. */
function quantities<U extends string>(r: Reader, k: number, units: ReadonlyMap<string, U>) {
  const values = new Map<U, number>();
  let next = quantity(r, k, units, values);
  if (next === 0) return null;
  if (punctAt(r, next) === "(") {
    const inner = quantity(r, next + 1, units, values);
    if (inner > 0 && punctAt(r, inner) === ")") next = inner + 1;
  }
  return { values, next };
}

function setPressure(r: Reader, values: ReadonlyMap<PressureUnit | "bar", number>): void {
  const bar = values.get("bar");
  const mark: PressureMark = { kPa: values.get("kPa") ?? (bar === undefined ? null : bar * 100), psi: values.get("psi") ?? null };
  const d = r.draft;
  if (d.maxPressure && (d.maxPressure.kPa !== mark.kPa || d.maxPressure.psi !== mark.psi)) {
    d.warnings.push("Two different maximum pressures are marked; the first is used.");
  }
  d.maxPressure ??= mark;
}

function readMaxLoad(r: Reader, i: number, j: number): number {
  const which = wordAt(r, j);
  const dual = which === "DUAL" || which === "D";
  if (dual || which === "SINGLE" || which === "S") j++;
  const q = quantities(r, skipPunct(r, j, ":"), LOAD_UNITS);
  if (!q) return 0;
  const d = r.draft;
  const mark: LoadMark = { kg: q.values.get("kg") ?? null, lb: q.values.get("lb") ?? null };
  const key = dual ? "maxLoadDual" : "maxLoadSingle";
  const old = d[key];
  if (old && (old.kg !== mark.kg || old.lb !== mark.lb)) d.warnings.push("Two different maximum loads are marked; the first is used.");
  d[key] ??= mark;
  addSpan(r, "maxLoad", i, q.next);
  let next = q.next;
  if (wordAt(r, next) === "AT") {
    const p = quantities(r, next + 1, PRESSURE_UNITS);
    if (p) {
      setPressure(r, p.values);
      next = p.next + (wordAt(r, p.next) === "COLD" ? 1 : 0);
      next = maxPressureLabel(r, next) || next;
      addSpan(r, "maxPressure", q.next, next);
    }
  }
  return next;
}

/** "MAX LOAD 1360 KG (2998 LBS)", "MAX LOAD SINGLE … AT 550 KPA (80 PSI) COLD", "MAX. PRESS. 350 KPA (51 PSI)". */
export function readMaxRating(r: Reader, i: number): number {
  const j = skipPunct(r, i + 1, ".");
  if (wordAt(r, j) === "LOAD") return readMaxLoad(r, i, skipPunct(r, j + 1, "."));
  const label = maxPressureLabel(r, i);
  const p = label === 0 ? null : quantities(r, skipPunct(r, label, ":"), PRESSURE_UNITS);
  if (!p) return 0;
  setPressure(r, p.values);
  const next = p.next + (wordAt(r, p.next) === "COLD" ? 1 : 0);
  addSpan(r, "maxPressure", i, next);
  return next;
}

/** A maximum pressure labelled after its figure: "350 KPA (51 PSI) MAX. PRESS.", "51 PSI MAX PRESSURE". */
export function readPressureThenLabel(r: Reader, i: number): number {
  const p = quantities(r, i, PRESSURE_UNITS);
  const next = p ? maxPressureLabel(r, p.next) : 0;
  if (!p || next === 0) return 0;
  setPressure(r, p.values);
  addSpan(r, "maxPressure", i, next);
  return next;
}
