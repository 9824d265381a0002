import { type UnitSystem } from "@/lib/tire/display";
import { placardCheck } from "@/lib/tire/placard";
import { lbToKg } from "@/lib/tire/units";
import type { FinderQuery } from "./finder-query";

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
