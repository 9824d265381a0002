import { isLoadRange } from "../load-range";
import { endOf, endsChunk, numAt, punctAt, skipPunct, startOf, wordAt, type Draft, type Reader } from "./reader";

// The record… functions take the characters [start, end) a mark was read from, so that the token
// readers here and the shortcut in `usual-marks.ts` record a mark the same way.

/** Records a load range; the letter must be a known one. */
export function recordLoadRange(d: Draft, letter: string, start: number, end: number): void {
  if (!isLoadRange(letter)) {
    d.warnings.push(`Load range ${letter} is not a known load range (B to N).`);
    d.spans.push({ part: "unread", start, end });
    return;
  }
  if (d.loadRange !== null && d.loadRange !== letter) {
    d.warnings.push(`Two load ranges are marked (${d.loadRange} and ${letter}); ${d.loadRange} is used.`);
  }
  d.loadRange ??= letter;
  d.spans.push({ part: "loadRange", start, end });
}

/** Records a load range read from tokens [from, to). */
export function setLoadRange(r: Reader, letter: string, from: number, to: number): void {
  recordLoadRange(r.draft, letter, startOf(r, from), endOf(r, to));
}

/** "LOAD RANGE E", "LR E", "LR-E", "LRE". */
export function readLoadRange(r: Reader, i: number): number {
  const w = wordAt(r, i);
  let j: number;
  let letter: string | undefined;
  if (w === "LOAD" && wordAt(r, i + 1) === "RANGE") {
    j = skipPunct(r, i + 2, ":-");
    letter = wordAt(r, j++);
  } else if (w === "LR") {
    j = skipPunct(r, i + 1, ":-");
    letter = wordAt(r, j++);
  } else if (w?.length === 3 && w.startsWith("LR")) {
    j = i + 1;
    letter = w[2];
  } else {
    return 0;
  }
  if (letter?.length !== 1 || !endsChunk(r, j)) return 0;
  setLoadRange(r, letter, i, j);
  return j;
}

/**
 * A lone load-range letter after a light-truck, trailer or inch-width size: "LT265/75R16 123/120S E",
 * "ST205/75R15 107/102M D", "11R22.5 146/143L G". ST and truck tires carry load ranges as LT tires
 * do (TRA, common practice); metric sizes without a prefix have none.
 */
export function readLoneLoadRange(r: Reader, i: number): number {
  const w = wordAt(r, i);
  const size = r.draft.size;
  const rangedSize = size !== null && (size.prefix === "LT" || size.prefix === "ST" || size.kind !== "metric");
  if (!rangedSize || w?.length !== 1 || !isLoadRange(w) || !endsChunk(r, i + 1)) return 0;
  setLoadRange(r, w, i, i + 1);
  return i + 1;
}

/** "10PR", "10 PLY", "10-ply", "10 PLY RATING". */
export function readPlyRating(r: Reader, i: number): number {
  const n = numAt(r, i);
  if (!n?.plain) return 0;
  let j = skipPunct(r, i + 1, "-");
  const w = wordAt(r, j);
  if (w !== "PR" && w !== "PLY") return 0;
  j++;
  if (wordAt(r, j) === "RATING") j++;
  if (!endsChunk(r, j)) return 0;
  recordPlyRating(r.draft, r.input, n.value, startOf(r, i), endOf(r, j));
  return j;
}

/** Records a ply rating of `value` written in [start, end) of `input`. */
export function recordPlyRating(d: Draft, input: string, value: number, start: number, end: number): void {
  if (value < 2 || value > 40) {
    d.warnings.push(`"${input.slice(start, end)}" is not a usual ply rating (2 to 40).`);
    d.spans.push({ part: "unread", start, end });
    return;
  }
  if (d.plyRating !== null && d.plyRating !== value) {
    d.warnings.push(`Two ply ratings are marked (${d.plyRating} and ${value}); ${d.plyRating} is used.`);
  }
  d.plyRating ??= value;
  d.spans.push({ part: "plyRating", start, end });
}

export function recordLoadType(d: Draft, type: "SL" | "XL", start: number, end: number): void {
  if (d.loadType !== null && d.loadType !== type) {
    d.warnings.push("Both standard load (SL) and extra load (XL) are marked; extra load is used.");
  }
  if (d.loadType !== "XL") d.loadType = type;
  d.spans.push({ part: "loadType", start, end });
}

export function recordRunFlat(d: Draft, start: number, end: number): void {
  d.runFlat = true;
  d.spans.push({ part: "runFlat", start, end });
}

/** "RF" reads as reinforced once a service description has been read, and as run-flat before one (in or right after the size). */
export function recordRf(d: Draft, start: number, end: number): void {
  if (d.service) recordLoadType(d, "XL", start, end);
  else recordRunFlat(d, start, end);
}

export function recordWinter(d: Draft, mark: "mudAndSnow" | "threePeak", start: number, end: number): void {
  // Each field by its name: a write by a computed key is slow.
  if (mark === "mudAndSnow") d.mudAndSnow = true;
  else d.threePeak = true;
  d.spans.push({ part: "winter", start, end });
}

/** "XL", "Extra Load", "Reinforced", "SL", "Standard Load", and "RF" (see `recordRf`). */
export function readLoadType(r: Reader, i: number): number {
  const w = wordAt(r, i);
  const next = wordAt(r, i + 1);
  let to = i + 1;
  let type: "SL" | "XL" | "RF";
  if (w === "XL" || w === "REINFORCED" || w === "REINF") type = "XL";
  else if (w === "SL") type = "SL";
  else if (w === "RF") type = "RF";
  else if (w === "EXTRA" && next === "LOAD") [type, to] = ["XL", i + 2];
  else if (w === "STANDARD" && next === "LOAD") [type, to] = ["SL", i + 2];
  else return 0;
  if (!endsChunk(r, to)) return 0;
  if (type === "RF") recordRf(r.draft, startOf(r, i), endOf(r, to));
  else recordLoadType(r.draft, type, startOf(r, i), endOf(r, to));
  return to;
}

/** "RFT", "Runflat", "Run Flat", "Run-Flat". */
export function readRunFlat(r: Reader, i: number): number {
  const w = wordAt(r, i);
  let to = 0;
  if (w === "RFT" || w === "RUNFLAT") to = i + 1;
  else if (w === "RUN") {
    const j = skipPunct(r, i + 1, "-");
    if (wordAt(r, j) === "FLAT") to = j + 1;
  }
  if (to === 0 || !endsChunk(r, to)) return 0;
  recordRunFlat(r.draft, startOf(r, i), endOf(r, to));
  return to;
}

function setWinter(r: Reader, mark: "mudAndSnow" | "threePeak", from: number, to: number): number {
  recordWinter(r.draft, mark, startOf(r, from), endOf(r, to));
  return to;
}

/** "M+S", "M/S", "M&S", "MS", "Mud and Snow". */
export function readMudAndSnow(r: Reader, i: number): number {
  const w = wordAt(r, i);
  let to = 0;
  if (w === "MS") to = i + 1;
  else if (w === "M" && "+/&".includes(punctAt(r, i + 1) ?? "x") && wordAt(r, i + 2) === "S") to = i + 3;
  else if (w === "MUD" && (wordAt(r, i + 1) === "AND" || "+&".includes(punctAt(r, i + 1) ?? "x"))) {
    if (wordAt(r, i + 2) === "SNOW") to = i + 3;
  }
  return to > 0 && endsChunk(r, to) ? setWinter(r, "mudAndSnow", i, to) : 0;
}

/** "3PMSF", "3 PMSF", "three-peak mountain snowflake", "3 peak mountain snow flake". */
export function readThreePeak(r: Reader, i: number): number {
  const three = wordAt(r, i) === "THREE" || numAt(r, i)?.text === "3";
  if (!three) return 0;
  let j = skipPunct(r, i + 1, "-");
  const w = wordAt(r, j);
  if (w === "PMSF") j++;
  else if (w === "PEAK" || w === "PEAKS") {
    j = skipPunct(r, j + 1, "-");
    if (wordAt(r, j++) !== "MOUNTAIN") return 0;
    const flake = wordAt(r, j++);
    if (flake === "SNOW" && wordAt(r, j) === "FLAKE") j++;
    else if (flake !== "SNOWFLAKE") return 0;
  } else return 0;
  return endsChunk(r, j) ? setWinter(r, "threePeak", i, j) : 0;
}
