import { isLoadRange } from "../load-range";
import type { SizePrefix, TireSize } from "../types";
import { MM_PER_INCH } from "../units";
import { endsChunk, glued, numAt, punctAt, wordAt, type Reader } from "./reader";
import {
  BIAS, CONSTRUCTION_CODES, construction, decimals, flotationExample, inRange, makeSize, metricExample, miss, PREFIXES, RADIAL,
  RADIAL_ASSUMED, rimMiss, rimStatus, SIZE_BOUNDS, type SizeMatch, type SizeTokens,
} from "./size-parts";
import type { Token } from "./tokens";

/**
 * A letter right after the rim: "C" (ETRTO commercial), "LT" (a trailing LT), or a load range ("LT265/75R16E").
 * On sizes that are not LT-type only a letter touching the rim counts as a load range.
 */
function readSuffix(r: Reader, m: SizeMatch & { size: TireSize; at: SizeTokens }, k: number): void {
  const w = wordAt(r, k);
  if (w === undefined || !endsChunk(r, k + 1)) return;
  const size = m.size;
  const ltType = size.kind !== "metric" || size.prefix === "LT" || size.prefix === "ST";
  const canBeLt = size.prefix === null || size.prefix === "LT";
  let letter: string | null = null;
  if (w === "LT" && canBeLt) size.prefix = "LT";
  else if (w.length === 3 && w.startsWith("LT") && canBeLt && isLoadRange(w.slice(2))) {
    size.prefix = "LT";
    letter = w.slice(2);
  } else if (w === "C" && !ltType && size.prefix === null) size.commercial = true;
  else if (w.length === 1 && isLoadRange(w) && (ltType || glued(r, k))) letter = w;
  else return;
  m.end = k + 1;
  m.sizeEnd = letter === null ? k + 1 : k;
  m.loadRangeLetter = letter;
  if (letter === null) m.at.suffix = k;
}

function found(r: Reader, size: TireSize, at: SizeTokens, assumed: string | null): SizeMatch {
  const m = { end: at.rim + 1, sizeEnd: at.rim + 1, size, problem: null, assumed, loadRangeLetter: null, at };
  readSuffix(r, m, at.rim + 1);
  return m;
}

function matchFlotation(r: Reader, i: number, j: number, prefix: SizePrefix | null): SizeMatch | null {
  if (prefix !== null && prefix !== "LT") return null;
  const diameter = numAt(r, j) as Token;
  const width = numAt(r, j + 2) as Token;
  const c = construction(r, j + 3, true);
  if (!c) return miss(j + 3, "the construction letter and rim diameter are missing", `Write it as marked, e.g. ${flotationExample(diameter, width)}.`);
  const k = j + 3 + c.tokens;
  const rimOk = rimStatus(r, k);
  if (rimOk !== "ok") return rimMiss(r, k, rimOk, flotationExample(diameter, width));
  const rim = numAt(r, k) as Token;
  if (!inRange(diameter.value, SIZE_BOUNDS.flotationDiameterIn) || decimals(diameter) > 2 ||
      !inRange(width.value, SIZE_BOUNDS.flotationWidthIn) || decimals(width) > 2 || diameter.value - rim.value < 2) {
    return miss(k + 1, "the numbers do not make a flotation size", "Flotation sizes read overall diameter x section width (inches), then the rim, e.g. 33x12.50R15LT.");
  }
  const size = makeSize("flotation", prefix, width.value * MM_PER_INCH, null, c.code, rim.value, diameter.value);
  const at = { prefix: prefix ? i : -1, first: j, second: j + 2, construction: c.assumed ? -1 : j + 3, rim: k, suffix: -1, runTogether: false };
  return found(r, size, at, c.assumed ? RADIAL_ASSUMED : null);
}

/**
 * Truck and inch-width sizes: a width in inches, R or a dash (bias), the rim as marked: "11R22.5",
 * "7.50R16LT", "7.50-16", "ST4.80-12". Anything else (a "10-PLY", a metric width) is left to the other readers.
 */
function matchInch(r: Reader, i: number, j: number, prefix: SizePrefix | null): SizeMatch | null {
  if (prefix !== null && prefix !== "LT" && prefix !== "ST") return null;
  const width = numAt(r, j);
  if (!width || (width.plain && width.text.length > 2) || decimals(width) > 2 || !inRange(width.value, SIZE_BOUNDS.inchWidthIn)) return null;
  const code = CONSTRUCTION_CODES.get(wordAt(r, j + 1) ?? "");
  const marked = code && !code.zr && !code.runFlat && code.construction !== "B" ? code : punctAt(r, j + 1) === "-" ? BIAS : null;
  if (!marked || rimStatus(r, j + 2) !== "ok") return null;
  const rim = numAt(r, j + 2) as Token;
  if (rim.value <= width.value) return null;
  // Hundredths of an inch × 0.254 mm, in whole numbers first, so 4.80 in reads 121.92 mm, not 121.91999….
  const size = makeSize("inch", prefix, (Math.round(width.value * 100) * 254) / 1000, null, marked, rim.value, null);
  const at = { prefix: prefix ? i : -1, first: j, second: -1, construction: j + 1, rim: j + 2, suffix: -1, runTogether: false };
  const m = found(r, size, at, null);
  // Without LT or ST, an inch-width size is a truck or commercial size.
  if (size.prefix === null) size.commercial = true;
  return m;
}

/** Width and aspect ratio: "285/50", "285-50", "285 50", or run together as "28550". */
function widthAndAspect(r: Reader, j: number) {
  const first = numAt(r, j) as Token;
  const t = first.text;
  if (t.length === 5 || t.length === 7) {
    return { width: Number(t.slice(0, 3)), aspect: Number(t.slice(3, 5)), rim: t.length === 7 ? Number(t.slice(5)) : null, second: j, next: j + 1, sep: "" };
  }
  if (t.length !== 2 && t.length !== 3) return null;
  const width = first.value;
  const sep = punctAt(r, j + 1);
  const second = numAt(r, j + 2);
  if ((sep === "/" || sep === "-") && second?.plain && second.text.length === 2) {
    return { width, aspect: second.value, rim: null, second: j + 2, next: j + 3, sep };
  }
  const spaced = numAt(r, j + 1);
  if (t.length === 3 && spaced?.gap && spaced.plain && spaced.text.length === 2) {
    return { width, aspect: spaced.value, rim: null, second: j + 1, next: j + 2, sep: " " };
  }
  return { width, aspect: null, rim: null, second: -1, next: j + 1, sep: sep === "/" || sep === "-" ? sep : "" };
}

function validMetric(r: Reader, size: TireSize, at: SizeTokens, assumed: string | null): SizeMatch {
  const next = at.rim + 1;
  if (!inRange(size.sectionWidthMm, SIZE_BOUNDS.sectionWidthMm)) {
    return miss(next, `a section width of ${size.sectionWidthMm} mm is not a tire size`, "Section widths run from 60 to 499 mm, e.g. 205/55R16.");
  }
  if (size.aspectRatio !== null && !inRange(size.aspectRatio, SIZE_BOUNDS.aspectRatio)) {
    return miss(next, `an aspect ratio of ${size.aspectRatio} is not a tire size`, "Aspect ratios run from 20 to 95, e.g. 205/55R16.");
  }
  return found(r, size, at, assumed);
}

function matchMetric(r: Reader, i: number, j: number, prefix: SizePrefix | null): SizeMatch | null {
  if (!numAt(r, j)?.plain) return null;
  const wa = widthAndAspect(r, j);
  if (!wa) return null;
  const at: SizeTokens = { prefix: prefix ? i : -1, first: j, second: wa.second, construction: -1, rim: -1, suffix: -1, runTogether: wa.sep === "" && wa.aspect !== null };
  if (wa.rim !== null) {
    if (!endsChunk(r, wa.next) || !inRange(wa.rim, SIZE_BOUNDS.rimDiameterIn)) return null;
    at.rim = j;
    return validMetric(r, makeSize("metric", prefix, wa.width, wa.aspect, RADIAL, wa.rim, null), at, RADIAL_ASSUMED);
  }
  let k = wa.next;
  if (wa.aspect === null) {
    if (wa.sep !== "") {
      if (!CONSTRUCTION_CODES.has(wordAt(r, k + 1) ?? "") || !numAt(r, k + 2)) return null;
      return miss(k + 3, "the aspect ratio is missing", `Write the aspect ratio after the slash, e.g. ${wa.width}/55${wordAt(r, k + 1)}${numAt(r, k + 2)?.text}.`);
    }
    // Sizes marked without an aspect ratio: "155R13", "185R14C".
    const code = CONSTRUCTION_CODES.get(wordAt(r, k) ?? "");
    if (!code || wa.width < 100 || !numAt(r, k + 1)) return null;
    const rim = rimStatus(r, k + 1);
    if (rim !== "ok") return rimMiss(r, k + 1, rim, `${wa.width}R13`);
    at.construction = k;
    at.rim = k + 1;
    return validMetric(r, makeSize("metric", prefix, wa.width, null, code, (numAt(r, k + 1) as Token).value, null), at, null);
  }
  const c = construction(r, k, wa.sep === "/");
  if (!c) {
    const letter = wordAt(r, k);
    return letter !== undefined && numAt(r, k + 1) && glued(r, k + 1)
      ? miss(k + 2, `"${letter}" is not a construction code`, `Use R (radial), D or - (bias) or B (belted), e.g. ${metricExample(wa.width, wa.aspect)}.`)
      : miss(k, "the construction letter and rim diameter are missing", `Add them after the aspect ratio, e.g. ${metricExample(wa.width, wa.aspect)}.`);
  }
  if (!c.assumed) at.construction = k;
  k += c.tokens;
  const rim = rimStatus(r, k);
  if (rim !== "ok") return rimMiss(r, k, rim, metricExample(wa.width, wa.aspect));
  at.rim = k;
  // Anything but the standard slash and construction letter gets a note of how it was read.
  const note = c.assumed ? RADIAL_ASSUMED : wa.sep === "/" ? null : "";
  return validMetric(r, makeSize("metric", prefix, wa.width, wa.aspect, c.code, (numAt(r, k) as Token).value, null), at, note);
}

/** Reads the tokens at i as a size, a size-like text with a problem, or nothing (null). */
export function matchSize(r: Reader, i: number): SizeMatch | null {
  let j = i;
  let prefix: SizePrefix | null = null;
  const w = wordAt(r, i);
  if (w !== undefined) {
    if (!PREFIXES.has(w) || !numAt(r, i + 1)) return null;
    prefix = w as SizePrefix;
    j = i + 1;
  }
  if (wordAt(r, j + 1) === "X" && numAt(r, j + 2)) return matchFlotation(r, i, j, prefix);
  return matchInch(r, i, j, prefix) ?? matchMetric(r, i, j, prefix);
}
