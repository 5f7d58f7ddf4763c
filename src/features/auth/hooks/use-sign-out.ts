import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useNavigate } from "react-router";
import { toast } from "../../../lib/toast";
import { paths } from "../../../config/paths";
import { clearOfflineApiCache } from "../../../lib/offline-cache";
import { authKeys } from "../api/keys";
import { describeAuthError } from "../utils/auth-errors";

export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: async () => {
      // better-auth's client is loaded when it is needed: the top bar is on every first page, signing out is rare.
      const { authClient } = await import("../../../lib/auth-client");
      const { error } = await authClient.signOut();
      if (error) throw new Error(describeAuthError(error, "Could not sign out. Please try again.").message);
    },
    onSuccess: async () => {
      queryClient.setQueryData(authKeys.me(), null);
      // Nothing fetched for the previous account may linger in the cache.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      // Nor in the answers the service worker kept for offline use.
      await clearOfflineApiCache();
      await queryClient.invalidateQueries({ queryKey: authKeys.all });
      await navigate(paths.home.href());
      toast.success("You are signed out.");
    },
  });
}
