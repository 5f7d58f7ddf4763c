import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AdoptPlanResponse, PracticePlanResponse, StartPlanResponse } from "#shared/schemas/practice-plan";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";

export const planKeys = {
  all: ["practice-plan"] as const,
  plan: (playerId?: string) => [...planKeys.all, playerId ?? "me"] as const,
};

/** GET /api/practice-plan[?playerId=]: what the log proposes, and the plan under way. */
export function practicePlanQueryOptions(playerId?: string) {
  return queryOptions({
    queryKey: planKeys.plan(playerId),
    queryFn: ({ signal }) => api.get<PracticePlanResponse>(apiPaths.practicePlan, { query: playerId ? { playerId } : {}, signal }),
  });
}

export function usePracticePlan(playerId?: string) {
  return useQuery(practicePlanQueryOptions(playerId));
}

/** POST /api/practice-plan/start → 201 { assignmentId, active }: the player's own runnable ladder. */
export function useStartPlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<StartPlanResponse>(apiPaths.practicePlanStart, {}),
    meta: { errorToast: false },
    // The new assignment shows in "My ladders" too, a query of the coaching feature.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}

/** POST /api/practice-plan/adopt { playerId } → 201 { ladderId, active }: a ladder in the coach's library. */
export function useAdoptPlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (playerId: string) => api.post<AdoptPlanResponse>(apiPaths.practicePlanAdopt, { playerId }),
    meta: { errorToast: false },
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
