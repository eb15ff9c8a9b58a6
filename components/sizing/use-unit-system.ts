"use client";

import { useCallback, useState, useSyncExternalStore } from "react";
import type { UnitSystem } from "@/lib/units";

export const UNIT_STORAGE_KEY = "presswright:unit-system";
const CHANGE_EVENT = "presswright:unit-system";

function readStored(): UnitSystem | null {
  try {
    const value = window.localStorage.getItem(UNIT_STORAGE_KEY);
    return value === "metric" || value === "imperial" ? value : null;
  } catch {
    return null; // storage disabled (private mode, policy): fall back to the default
  }
}

function subscribe(onChange: () => void): () => void {
  // "storage" fires for other tabs; our own writes announce themselves with CHANGE_EVENT.
  window.addEventListener("storage", onChange);
  window.addEventListener(CHANGE_EVENT, onChange);
  return () => {
    window.removeEventListener("storage", onChange);
    window.removeEventListener(CHANGE_EVENT, onChange);
  };
}

/**
 * The unit system of the calculator. A choice made here wins; otherwise a signed-in user's saved
 * preference; otherwise what this browser remembered; otherwise metric. Choices are remembered in
 * localStorage. The server render uses no storage, so hydration always matches.
 */
export function useUnitSystem(accountSystem: UnitSystem | null): [UnitSystem, (system: UnitSystem) => void] {
  const stored = useSyncExternalStore(subscribe, readStored, () => null);
  const [chosen, setChosen] = useState<UnitSystem | null>(null);
  const system = chosen ?? accountSystem ?? stored ?? "metric";
  const choose = useCallback((next: UnitSystem) => {
    setChosen(next);
    try {
      window.localStorage.setItem(UNIT_STORAGE_KEY, next);
      window.dispatchEvent(new Event(CHANGE_EVENT));
    } catch {
      // Not remembered, but the switch still works for this visit.
    }
  }, []);
  return [system, choose];
}
