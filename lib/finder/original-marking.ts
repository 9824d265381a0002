import { parseMarking } from "@/lib/tire/parse/parse-marking";
import { serviceType } from "@/lib/tire/service-type";
import { sizeToSlug } from "@/lib/tire/format";
import { type Marking } from "@/lib/tire/types";
import type { FinderQuery } from "./finder-query";

export type OriginalReading =
  | { ok: true; marking: Marking; passengerTire: boolean; sizeSlug: string }
  | { ok: false; message: string };

/**
 * The tire on the car, read from the finder's address by the same reader as everything else. Read by
 * the page on the server: it fixes the finder's key, so the browser never reads it again.
 */
export function readOriginalMarking(query: FinderQuery): OriginalReading {
  if (!query.size || query.loadIndex === undefined || !query.speedSymbol) {
    return { ok: false, message: "Enter the size, load index and speed symbol of the tire on the car." };
  }
  const dual = query.loadIndexDual === undefined ? "" : `/${query.loadIndexDual}`;
  const loadRange = query.loadRange ? ` LR${query.loadRange}` : "";
  const marking = parseMarking(`${query.size} ${query.loadIndex}${dual}${query.speedSymbol}${loadRange}`);
  if (!marking.ok) return { ok: false, message: marking.error.message };
  if (!marking.size || !marking.service) {
    return { ok: false, message: `"${query.size} ${query.loadIndex}${query.speedSymbol}" is not a size with a load index and speed symbol.` };
  }
  return { ok: true, marking, passengerTire: serviceType(marking.size) === "passenger", sizeSlug: sizeToSlug(marking.size) };
}
