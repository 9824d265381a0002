import { formatLoad, type UnitSystem } from "./display";
import { loadIndexKg, minimumLoadIndex } from "./load-index";

/** FMVSS 120 S5.1.2: a passenger-car tire on an MPV, truck, bus or trailer counts its load rating ÷ 1.10. */
export const PASSENGER_TIRE_ON_TRUCK_FACTOR = 1.1;

export type VehicleType = "passenger-car" | "mpv-truck-trailer";

export interface AxleInput {
  name: string;
  /** Gross axle weight rating, from the vehicle's certification label. */
  gawrKg: number;
  dualWheels: boolean;
}

export interface AxleRequirement {
  name: string;
  dualWheels: boolean;
  tiresOnAxle: 2 | 4;
  perTireKg: number;
  /** What the tire's rating must reach: per-tire load, × 1.10 for a passenger-car tire on a truck. */
  requiredKg: number;
  minLoadIndex: number | null;
  steps: string[];
}

export interface PlacardCheck {
  axles: AxleRequirement[];
  /** The single index every tire on a single-wheel axle needs; null when no such axle or beyond the table. */
  minLoadIndex: number | null;
  /** The dual index the tires on a dual-wheel axle need. */
  minLoadIndexDual: number | null;
}

function checkAxle(axle: AxleInput, passengerTireOnTruck: boolean, units: UnitSystem): AxleRequirement {
  const tiresOnAxle = axle.dualWheels ? 4 : 2;
  const perTireKg = axle.gawrKg / tiresOnAxle;
  const requiredKg = passengerTireOnTruck ? perTireKg * PASSENGER_TIRE_ON_TRUCK_FACTOR : perTireKg;
  const minLoadIndex = minimumLoadIndex(requiredKg) ?? null;
  const steps = [`${axle.name} axle: GAWR ${formatLoad(axle.gawrKg, units)} ÷ ${tiresOnAxle} tires = ${formatLoad(perTireKg, units)} per tire.`];
  if (passengerTireOnTruck) {
    steps.push(
      `A passenger-car tire on an MPV, truck or trailer counts its rating ÷ 1.10, so it must be rated for ${formatLoad(perTireKg, units)} × 1.10 = ${formatLoad(requiredKg, units)}.`,
    );
  }
  const indexKind = axle.dualWheels ? "dual load index" : "load index";
  steps.push(
    minLoadIndex === null
      ? `No load index in the table carries ${formatLoad(requiredKg, units)}.`
      : `The lowest ${indexKind} carrying at least ${formatLoad(requiredKg, units)} is ${minLoadIndex} (${formatLoad(loadIndexKg(minLoadIndex)!, units)}).`,
  );
  return { name: axle.name, dualWheels: axle.dualWheels, tiresOnAxle, perTireKg, requiredKg, minLoadIndex, steps };
}

function highest(values: (number | null)[]): number | null {
  const present = values.filter((value): value is number => value !== null);
  return present.length === 0 ? null : Math.max(...present);
}

/**
 * The Placard check: from each axle's GAWR, the minimum load index per tire. Dual-wheel axles need
 * the dual index; the factor applies only to passenger-car tires on MPVs, trucks and trailers.
 */
export function placardCheck(axles: AxleInput[], vehicleType: VehicleType, passengerTire: boolean, units: UnitSystem): PlacardCheck {
  const passengerTireOnTruck = passengerTire && vehicleType === "mpv-truck-trailer";
  const checked = axles.map((axle) => checkAxle(axle, passengerTireOnTruck, units));
  return {
    axles: checked,
    minLoadIndex: highest(checked.filter((axle) => !axle.dualWheels).map((axle) => axle.minLoadIndex)),
    minLoadIndexDual: highest(checked.filter((axle) => axle.dualWheels).map((axle) => axle.minLoadIndex)),
  };
}
