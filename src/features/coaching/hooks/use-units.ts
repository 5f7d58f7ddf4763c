import type { UnitSystem } from "../../../../shared/units";
import { useMe } from "../../auth/api/get-me";

/** The signed-in user's units (every coaching page needs an account); feet until the account is known. */
export function useUnits(): UnitSystem {
  const me = useMe();
  return me.data?.preferences.units ?? "imperial";
}
