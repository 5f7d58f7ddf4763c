import { useCallback, useSyncExternalStore } from "react";
import { UNIT_SYSTEMS, type UnitSystem } from "#shared/units";
import { useMe } from "../api/get-me";
import { useUpdatePreferences } from "../api/update-preferences";

const STORAGE_KEY = "borrowline.units";
const CHANGE_EVENT = "borrowline:units";

function readStored(): UnitSystem | null {
  try {
    const v = window.localStorage.getItem(STORAGE_KEY);
    return v && (UNIT_SYSTEMS as readonly string[]).includes(v) ? (v as UnitSystem) : null;
  } catch {
    return null;
  }
}

function writeStored(units: UnitSystem) {
  try {
    window.localStorage.setItem(STORAGE_KEY, units);
  } catch {
    // Private mode without storage: the choice lasts for this page only.
  }
  window.dispatchEvent(new Event(CHANGE_EVENT));
}

function subscribe(onChange: () => void) {
  window.addEventListener("storage", onChange);
  window.addEventListener(CHANGE_EVENT, onChange);
  return () => {
    window.removeEventListener("storage", onChange);
    window.removeEventListener(CHANGE_EVENT, onChange);
  };
}

/**
 * The user's units, remembered: signed in → their account preference (PATCH /api/me/preferences); signed out →
 * this browser's localStorage. `ready` is false until we know whether anyone is signed in.
 */
export function useUnits() {
  const me = useMe();
  const update = useUpdatePreferences();
  const stored = useSyncExternalStore(subscribe, readStored, () => null);
  const signedIn = Boolean(me.data);
  const pending = update.isPending ? update.variables?.units : undefined;
  const units: UnitSystem = (signedIn ? (pending ?? me.data?.preferences.units) : stored) ?? stored ?? "imperial";
  const { mutate } = update;

  const setUnits = useCallback(
    (next: UnitSystem) => {
      writeStored(next);
      if (signedIn) mutate({ units: next });
    },
    [signedIn, mutate],
  );

  return { units, setUnits, ready: !me.isPending, saving: update.isPending, error: update.error, signedIn };
}
