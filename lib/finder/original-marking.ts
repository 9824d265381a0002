import { type UnitSystem } from "@/lib/tire/display";
import { parseMarking } from "@/lib/tire/parse/parse-marking";
import { placardCheck } from "@/lib/tire/placard";
import { serviceType } from "@/lib/tire/service-type";
import { type Marking } from "@/lib/tire/types";
import { lbToKg } from "@/lib/tire/units";
import type { FinderQuery } from "./finder-query";

export type OriginalReading =
  | { ok: true; marking: Marking; passengerTire: boolean }
  | { ok: false; message: string };

/** The tire on the car, read from the finder's address by the same reader as everything else. */
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
  return { ok: true, marking, passengerTire: serviceType(marking.size) === "passenger" };
}

/** The Placard check for the axle ratings in the address, or null when none were entered. */
export function placardFor(query: FinderQuery, passengerTire: boolean, units: UnitSystem) {
  const toKg = (weight: number) => (query.gawrUnit === "kg" ? weight : lbToKg(weight));
  const axles = [
    query.gawrFront === undefined ? null : { name: "Front", gawrKg: toKg(query.gawrFront), dualWheels: false },
    query.gawrRear === undefined ? null : { name: "Rear", gawrKg: toKg(query.gawrRear), dualWheels: query.rearDuals !== undefined },
  ].filter((axle) => axle !== null);
  if (axles.length === 0) return null;
  return placardCheck(axles, query.vehicle ?? "passenger-car", passengerTire, units);
}
