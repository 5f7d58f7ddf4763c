import type { UnitSystem } from "../../../../shared/units";
import { useMe } from "../../auth/api/get-me";

/** The signed-in player's units (their account preference); imperial until it is known. */
export function useUnits(): UnitSystem {
  return useMe().data?.preferences.units ?? "imperial";
}
