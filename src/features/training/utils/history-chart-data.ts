// Training history → chart rows: oldest first, the score of each attempt and the rolling mean of the last few.
export type HistoryItem = { id: string; score: number; createdAt: string };
export type HistoryRow = { attempt: number; id: string; score: number; rollingMean: number; at: string };

/** Default window of the rolling mean, attempts. */
export const ROLLING_WINDOW = 5;

/**
 * Sort attempts oldest first (ties by id, so the order is stable) and add the mean score of the last `window`
 * attempts up to and including each one (fewer at the start), rounded to one decimal.
 */
export function historyChartData(items: readonly HistoryItem[], window = ROLLING_WINDOW): HistoryRow[] {
  const sorted = [...items].sort((a, b) => Date.parse(a.createdAt) - Date.parse(b.createdAt) || a.id.localeCompare(b.id));
  const rows: HistoryRow[] = [];
  let sum = 0;
  sorted.forEach((item, i) => {
    sum += item.score;
    if (i >= window) sum -= sorted[i - window]!.score;
    const n = Math.min(i + 1, window);
    rows.push({ attempt: i + 1, id: item.id, score: item.score, rollingMean: Math.round((sum / n) * 10) / 10, at: item.createdAt });
  });
  return rows;
}
