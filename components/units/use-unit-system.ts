"use client";

import { useCallback, useSyncExternalStore } from "react";
import { defaultUnitSystem, type UnitSystem } from "@/lib/tire/display";

const STORAGE_KEY = "sidewise:units";
const listeners = new Set<() => void>();

function readStored(): UnitSystem | null {
  try {
    const value = window.localStorage.getItem(STORAGE_KEY);
    return value === "metric" || value === "imperial" ? value : null;
  } catch {
    return null;
  }
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  window.addEventListener("storage", listener);
  return () => {
    listeners.delete(listener);
    window.removeEventListener("storage", listener);
  };
}

const getSnapshot = (): UnitSystem => readStored() ?? defaultUnitSystem(navigator.language);
const getServerSnapshot = (): UnitSystem => "metric";

/** The person's unit system: remembered across visits, first chosen from the browser's locale. */
export function useUnitSystem(): [UnitSystem, (units: UnitSystem) => void] {
  const units = useSyncExternalStore(subscribe, getSnapshot, getServerSnapshot);
  const setUnits = useCallback((next: UnitSystem) => {
    try {
      window.localStorage.setItem(STORAGE_KEY, next);
    } catch {
      // Private browsing may refuse storage; the choice then lasts for this page only.
    }
    listeners.forEach((listener) => listener());
  }, []);
  return [units, setUnits];
}
