import { formatSize } from "../format";
import type { DetailKind, TireSize } from "../types";
import { setLoadRange } from "./marks";
import { addDetail, addMiss, addSpan, endsChunk, numAt, textOf, wordAt, type Reader } from "./reader";
import { matchSize } from "./size-match";
import { CONSTRUCTION_CODES, type SizeTokens } from "./size-parts";

function addCharDetail(r: Reader, detail: DetailKind, token: number, from: number, to: number): void {
  const start = r.tokens[token]?.start ?? 0;
  r.draft.details.push({ detail, start: start + from, end: start + to });
}

function piece(r: Reader, detail: DetailKind, token: number): void {
  if (token >= 0) addDetail(r, detail, token, token + 1);
}

/** Records where each piece of the size was typed. */
function addSizeDetails(r: Reader, at: SizeTokens, flotation: boolean): void {
  piece(r, "prefix", at.prefix);
  if (at.runTogether) {
    addCharDetail(r, "sectionWidth", at.first, 0, 3);
    addCharDetail(r, "aspectRatio", at.first, 3, 5);
    if (at.rim === at.first) addCharDetail(r, "rimDiameter", at.first, 5, 7);
  } else {
    piece(r, flotation ? "overallDiameter" : "sectionWidth", at.first);
    piece(r, flotation ? "sectionWidth" : "aspectRatio", at.second);
  }
  piece(r, "construction", at.construction);
  if (at.rim !== at.first) piece(r, "rimDiameter", at.rim);
  if (at.suffix >= 0) addDetail(r, wordAt(r, at.suffix) === "C" ? "commercial" : "prefix", at.suffix, at.suffix + 1);
}

/** How a size typed in a forgiving form was read: `Read "28550R20" as 285/50R20.` */
export function readAsNote(text: string, size: TireSize, how: string): string {
  return `Read "${text}" as ${formatSize(size)}${how}.`;
}

/** Reads a tire size; the first size found is the one described, later ones are reported. */
export function readSize(r: Reader, i: number): number {
  const m = matchSize(r, i);
  if (!m?.size || !m.at) return 0;
  const d = r.draft;
  if (d.size) {
    d.warnings.push(`A second size, ${formatSize(m.size)}, is left out: only the first size is read.`);
    addSpan(r, "unread", i, m.end);
    return m.end;
  }
  d.size = m.size;
  if (m.assumed !== null) d.assumptions.push(readAsNote(textOf(r, i, m.sizeEnd), m.size, m.assumed));
  addSpan(r, "size", i, m.sizeEnd);
  addSizeDetails(r, m.at, m.size.kind === "flotation");
  if (m.loadRangeLetter !== null) setLoadRange(r, m.loadRangeLetter, m.sizeEnd, m.end);
  return m.end;
}

/** Size-like text that is not a valid size: explains what is wrong, for the warning or the error. */
export function diagnoseSize(r: Reader, i: number): number {
  const m = matchSize(r, i);
  if (!m?.problem) return 0;
  addMiss(r.draft, `"${textOf(r, i, m.end)}" is not a complete size: ${m.problem.message}.`, m.problem.suggestion);
  addSpan(r, "unread", i, m.end);
  return m.end;
}

/** "R16" or "ZR18" alone: a rim without the width and aspect ratio. */
export function diagnoseBareRim(r: Reader, i: number): number {
  const code = wordAt(r, i);
  const rim = numAt(r, i + 1);
  if (!CONSTRUCTION_CODES.has(code ?? "") || !rim?.plain || !endsChunk(r, i + 2)) return 0;
  addMiss(
    r.draft,
    `"${textOf(r, i, i + 2)}" is not a complete size: the section width and aspect ratio are missing.`,
    `Type the whole size as marked, e.g. 205/55${code}${rim.text}.`,
  );
  addSpan(r, "unread", i, i + 2);
  return i + 2;
}
