import { useQueryClient } from "@tanstack/react-query";
import { useNavigate, useSearchParams } from "react-router";
import { authKeys } from "../api/keys";
import { safeNext } from "../utils/safe-next";

/** After a successful sign-in or sign-up: refresh the current user, then go to `?next=` or home.
 *  The refresh comes first so a guarded page does not see the old "signed out" answer. */
export function useAfterSignIn() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = params.get("next");
  return async () => {
    await queryClient.invalidateQueries({ queryKey: authKeys.all });
    await navigate(safeNext(next), { replace: true });
  };
}
