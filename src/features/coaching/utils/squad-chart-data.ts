// Shapes the make rates of a squad's players into grouped bars: one group per distance band, one bar per player.
import type { BandRate } from "#shared/schemas/stats";
import type { UnitSystem } from "#shared/units";
import { bandLabel } from "./bands";

export type SquadChartSeries = { playerId: string; name: string; dataKey: string };
/** One group of bars: the band's label, then per series `p<i>` (make rate in %, or null without putts) and `p<i>n` (putts). */
export type SquadChartRow = { band: string } & Record<string, string | number | null>;
export type SquadChartData = { series: SquadChartSeries[]; rows: SquadChartRow[] };

/**
 * `rates` holds each player's bands (undefined while loading or when it failed: that player is left out).
 * Bands where nobody has a putt are dropped, so the chart does not show empty groups; a player without putts
 * in a band has a null there (no bar), which is not the same as 0 %.
 */
export function squadChartData(
  players: readonly { id: string; name: string }[],
  rates: ReadonlyMap<string, readonly BandRate[] | undefined>,
  units: UnitSystem,
): SquadChartData {
  const withData = players.filter((p) => rates.get(p.id));
  const series = withData.map((p, i) => ({ playerId: p.id, name: p.name, dataKey: `p${i}` }));
  const template = withData.length > 0 ? rates.get(withData[0]!.id)! : [];
  const rows: SquadChartRow[] = [];
  template.forEach((band, b) => {
    const row: SquadChartRow = { band: bandLabel(band.fromM, band.toM, units) };
    let anyPutts = false;
    series.forEach((s) => {
      const cell = rates.get(s.playerId)?.find((r) => r.fromM === band.fromM && r.toM === band.toM) ?? rates.get(s.playerId)?.[b];
      const attempts = cell?.attempts ?? 0;
      if (attempts > 0) anyPutts = true;
      row[s.dataKey] = attempts > 0 && cell?.rate != null ? Math.round(cell.rate * 1000) / 10 : null;
      row[`${s.dataKey}n`] = attempts;
    });
    if (anyPutts) rows.push(row);
  });
  return { series, rows };
}

/** One player's bands for a single-series chart: rate and its 95 % interval in %, putts per band. */
export type PlayerChartRow = { band: string; rate: number | null; low: number | null; high: number | null; attempts: number; made: number };

export function playerChartData(bands: readonly BandRate[], units: UnitSystem): PlayerChartRow[] {
  const pct = (x: number) => Math.round(x * 1000) / 10;
  return bands.map((b) => ({
    band: bandLabel(b.fromM, b.toM, units),
    rate: b.attempts > 0 && b.rate != null ? pct(b.rate) : null,
    low: b.ci95 ? pct(b.ci95[0]) : null,
    high: b.ci95 ? pct(b.ci95[1]) : null,
    attempts: b.attempts,
    made: b.made,
  }));
}
