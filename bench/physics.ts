// Physics benchmark: median time of curved inverse reads and of a 72-cell break chart, against a baseline of
// mathjs solveODE + nested bisection at the same 1 mm tolerance. Run alone: npx tsx bench/physics.ts
import { pathToFileURL } from "node:url";
import { breakChart, solveRead } from "../physics/index";
import { baselineRead } from "./physics-baseline";
import { median, timeMs } from "./timing";

export interface PhysicsBenchFigures {
  reads: {
    name: string;
    medianMs: number;
    integrations: number;
    baselineMedianMs: number;
    baselineRolls: number;
    ratio: number;
    aimDiffMm: number;
  }[];
  readMedianMs: number;
  chartMedianMs: number;
  chartCells: number;
  baselineReadMedianMs: number;
  ratio: number;
  goals: { readMs: number; chartMs: number; ratio: number };
}

const CASES = [
  { name: "3 m, 2 %, 90°, Stimp 10", distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 },
  { name: "3 m, 2 %, 45°, Stimp 10", distanceM: 3, slopePct: 2, fallLineDeg: 45, stimpFt: 10 },
  { name: "6 m, 3 %, 135°, Stimp 11", distanceM: 6, slopePct: 3, fallLineDeg: 135, stimpFt: 11 },
  { name: "1.5 m, 1 %, 270°, Stimp 12", distanceM: 1.5, slopePct: 1, fallLineDeg: 270, stimpFt: 12 },
  { name: "10 m, 2.5 %, 60°, Stimp 9", distanceM: 10, slopePct: 2.5, fallLineDeg: 60, stimpFt: 9 },
];
const ROLL_PAST_M = 0.45;

/** Run the benchmark and return its figures (times are medians, ms). */
export function runPhysicsBench(options: { readRuns?: number; chartRuns?: number; baselineRuns?: number } = {}): PhysicsBenchFigures {
  const readRuns = options.readRuns ?? 300;
  const chartRuns = options.chartRuns ?? 15;
  const baselineRuns = options.baselineRuns ?? 3;
  const reads = CASES.map(({ name, ...putt }) => {
    const input = { ...putt, pace: { rollPastM: ROLL_PAST_M } };
    const r = solveRead(input);
    if (!r.ok) throw new Error(`bench case ${name} cannot stop`);
    const medianMs = timeMs(() => solveRead(input), readRuns, 50);
    const base = baselineRead({ ...putt, rollPastM: ROLL_PAST_M });
    const baselineMedianMs = timeMs(() => baselineRead({ ...putt, rollPastM: ROLL_PAST_M }), baselineRuns, 1);
    return {
      name,
      medianMs,
      integrations: r.read.diagnostics.integrations,
      baselineMedianMs,
      baselineRolls: base.rolls,
      ratio: baselineMedianMs / medianMs,
      aimDiffMm: 1000 * (base.aimOffsetM - r.read.aimOffsetM),
    };
  });
  const chartInput = {
    slopePct: 2,
    stimpFt: 10,
    distancesM: [1, 2, 3, 5, 8, 12],
    fallLineDegs: [0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330],
    pace: { rollPastM: ROLL_PAST_M },
  };
  const chartMedianMs = timeMs(() => breakChart(chartInput), chartRuns, 3);
  const readMedianMs = median(reads.map((r) => r.medianMs));
  const baselineReadMedianMs = median(reads.map((r) => r.baselineMedianMs));
  return {
    reads,
    readMedianMs,
    chartMedianMs,
    chartCells: chartInput.distancesM.length * chartInput.fallLineDegs.length,
    baselineReadMedianMs,
    ratio: baselineReadMedianMs / readMedianMs,
    goals: { readMs: 1, chartMs: 50, ratio: 20 },
  };
}

/** Print the figures as a table. */
export function printPhysicsBench(f: PhysicsBenchFigures): void {
  const pad = (s: string, n: number) => s.padEnd(n);
  const num = (x: number, d = 3) => x.toFixed(d).padStart(10);
  console.log(pad("case", 30) + "   read ms  integr.  baseline ms  rolls     ratio  Δaim mm");
  for (const r of f.reads) {
    console.log(
      pad(r.name, 30) +
        num(r.medianMs) +
        String(r.integrations).padStart(9) +
        num(r.baselineMedianMs, 1).padStart(13) +
        String(r.baselineRolls).padStart(7) +
        num(r.ratio, 0) +
        num(r.aimDiffMm, 2).padStart(9),
    );
  }
  const ok = (b: boolean) => (b ? "met" : "NOT met");
  console.log(
    `\nread (median of cases): ${f.readMedianMs.toFixed(3)} ms  goal ≤ ${f.goals.readMs} ms: ${ok(f.readMedianMs <= f.goals.readMs)}`,
  );
  console.log(
    `break chart (${f.chartCells} cells): ${f.chartMedianMs.toFixed(1)} ms  goal ≤ ${f.goals.chartMs} ms: ${ok(f.chartMedianMs <= f.goals.chartMs)}`,
  );
  console.log(
    `baseline read (mathjs solveODE + bisection): ${f.baselineReadMedianMs.toFixed(1)} ms  ratio ${f.ratio.toFixed(0)}×  goal ≥ ${f.goals.ratio}×: ${ok(f.ratio >= f.goals.ratio)}`,
  );
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printPhysicsBench(runPhysicsBench());
}
