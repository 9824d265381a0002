import { LOAD_INDEX_MAX, loadIndexKg, loadIndexLb } from "../load-index";
import { speedSymbolInfo, type SpeedSymbolInfo } from "../speed-symbols";
import type { ServiceDescription } from "../types";
import { addDetail, addSpan, endsChunk, glued, numAt, punctAt, textOf, wordAt, type Reader } from "./reader";
import type { Token } from "./tokens";

export const MAX_DUAL_GAP = 20;
const SPEED_HINT = "Speed symbols are A1–A8, B to H, J to N, P to W, Y and (Y); Z is marked inside the size, as ZR.";

function loadIndexToken(r: Reader, i: number): Token | undefined {
  const t = numAt(r, i);
  return t?.plain && t.text.length <= 3 ? t : undefined;
}

/** The speed symbol at token j: "V", "A8", or bracketed "(Y)"; `spaced` when whitespace separates it from the load index. */
function speedAt(r: Reader, j: number, inBrackets: boolean) {
  if (!inBrackets && punctAt(r, j) === "(" && punctAt(r, j + 2) === ")") {
    const w = wordAt(r, j + 1);
    return w?.length === 1 ? { letters: w, bracketed: true, spaced: !glued(r, j), next: j + 3 } : null;
  }
  const w = wordAt(r, j);
  if (w?.length !== 1) return null;
  const digit = numAt(r, j + 1);
  const symbol = w === "A" && digit?.plain && digit.text.length === 1 && glued(r, j + 1) ? `A${digit.text}` : w;
  let next = symbol === w ? j + 1 : j + 2;
  if (inBrackets) {
    if (punctAt(r, next) !== ")") return null;
    next++;
  }
  return { letters: symbol, bracketed: inBrackets, spaced: !glued(r, j), next };
}

export function serviceDescription(loadIndex: number, loadIndexDual: number | null, info: SpeedSymbolInfo): ServiceDescription {
  return {
    loadIndex,
    loadIndexDual,
    speedSymbol: info.symbol,
    loadKg: loadIndexKg(loadIndex) ?? Number.NaN,
    loadLb: loadIndexLb(loadIndex) ?? Number.NaN,
    speedKmh: info.kmh,
    speedMph: info.mph,
    speedAbove: info.above,
  };
}

/**
 * Service description: "91V", "123/120S", "100A8", "(99Y)", "99(Y)", and "116 T" with a space.
 * A load index or speed symbol outside the tables is an error only in the unspaced form, where the
 * text cannot be anything else.
 */
export function readService(r: Reader, i: number): number {
  const open = punctAt(r, i) === "(";
  const first = open ? i + 1 : i;
  const single = loadIndexToken(r, first);
  if (!single) return 0;
  let j = first + 1;
  let dual: Token | undefined;
  if (punctAt(r, j) === "/") {
    dual = loadIndexToken(r, j + 1);
    // Dual indices sit a few steps below the single one; "285/50R" is an unfinished size instead.
    if (!dual || Math.abs(single.value - dual.value) > MAX_DUAL_GAP) return 0;
    j += 2;
  }
  const speedFrom = j;
  const speed = speedAt(r, j, open);
  // X is never a speed symbol but starts the second half of a flotation size ("33x…").
  if (!speed || speed.letters === "X" || !endsChunk(r, speed.next)) return 0;
  const symbol = speed.bracketed && speed.letters === "Y" ? "(Y)" : speed.letters;
  const info = speedSymbolInfo(symbol);
  const outOfTable = single.value > LOAD_INDEX_MAX || (dual !== undefined && dual.value > LOAD_INDEX_MAX);
  if (speed.spaced && (info === undefined || outOfTable)) return 0;
  const d = r.draft;
  const end = speed.next;
  if (outOfTable) {
    const bad = single.value > LOAD_INDEX_MAX ? single.value : dual?.value;
    d.fatal ??= {
      code: "unknown_load_index",
      message: `Load index ${bad} in "${textOf(r, i, end)}" is outside the published table (0 to ${LOAD_INDEX_MAX}).`,
      suggestion: "Check the number in front of the speed symbol; car and light-truck tires mostly show 70 to 130.",
    };
    return end;
  }
  if (info === undefined) {
    d.fatal ??= {
      code: "unknown_speed_symbol",
      message: `"${speed.letters}" in "${textOf(r, i, end)}" is not a speed symbol.`,
      suggestion: SPEED_HINT,
    };
    return end;
  }
  if (d.service) {
    d.warnings.push(`A second service description, ${textOf(r, i, end)}, is left out: only the first is read.`);
    addSpan(r, "unread", i, end);
    return end;
  }
  if (speed.bracketed && symbol !== "(Y)") d.assumptions.push(`Read "${textOf(r, i, end)}" as ${single.value}${dual ? `/${dual.value}` : ""}${symbol}.`);
  if (dual && dual.value > single.value) {
    d.warnings.push(`The dual load index ${dual.value} is higher than the single ${single.value}; it is normally lower. Check the marking.`);
  }
  d.service = serviceDescription(single.value, dual ? dual.value : null, info);
  addSpan(r, "service", i, end);
  addDetail(r, "loadIndex", first, first + 1);
  if (dual) addDetail(r, "loadIndexDual", first + 2, first + 3);
  addDetail(r, "speedSymbol", speedFrom, open ? end - 1 : end);
  return end;
}
