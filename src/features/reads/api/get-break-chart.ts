import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import type { ChartRequest, ChartResponse } from "#shared/schemas/reads";
import { apiPaths } from "../../../config/paths";
import { api } from "../../../lib/api-client";
import { readsKeys } from "./keys";
import { answerableHere } from "./solve-read";

/** POST /api/reads/chart: aim offsets over distances × fall-line directions (at most 400 cells). */
export async function getBreakChart(input: ChartRequest, signal?: AbortSignal): Promise<ChartResponse> {
  try {
    return await api.post<ChartResponse>(apiPaths.readsChart, input, { signal });
  } catch (error) {
    // No signal: the chart is worked out in the browser (the same physics).
    if (!answerableHere(error)) throw error;
    const { chartOffline } = await import("../utils/offline-answers");
    return chartOffline(input);
  }
}

export function breakChartQueryOptions(input: ChartRequest | null) {
  return queryOptions({
    queryKey: readsKeys.chart(input),
    queryFn: ({ signal }) => getBreakChart(input as ChartRequest, signal),
    enabled: input !== null,
    staleTime: Infinity,
    placeholderData: keepPreviousData,
    meta: { errorToast: false },
  });
}

export function useBreakChart(input: ChartRequest | null) {
  return useQuery(breakChartQueryOptions(input));
}
