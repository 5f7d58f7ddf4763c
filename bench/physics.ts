// Physics benchmark: median time of curved inverse reads (closed form) and of a 72-cell break chart, against the
// honest baseline (mathjs solveODE RK45 at 1 mm + 2-D Newton shooting) in the same run, each answer checked by
// re-integrating it with odex (simulateRoll). Run alone: npx tsx bench/physics.ts
import { pathToFileURL } from "node:url";
import { breakChart, simulateRoll, solveRead } from "../physics/index";
import { baselineRead } from "./physics-baseline";
import { median, timeMs } from "./timing";

export interface PhysicsBenchFigures {
  reads: {
    name: string;
    medianMs: number;
    baselineMedianMs: number;
    baselineRolls: number;
    ratio: number;
    /** Closest pass to the hole (mm) and pace error (mm) when each answer is re-integrated with odex. */
    passMm: number;
    paceMm: number;
    baselinePassMm: number;
    baselinePaceMm: number;
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

/** Re-integrate a launch with odex: closest pass (mm) and roll-past error (mm). */
function check(putt: (typeof CASES)[number], launchSpeedMps: number, startLineDeg: number): { passMm: number; paceMm: number } {
  const s = simulateRoll({ ...putt, launchSpeedMps, startLineDeg });
  if (!s.ok) throw new Error("cannot stop");
  const pass = s.roll.closestApproach;
  return { passMm: 1000 * pass.distanceM, paceMm: 1000 * Math.abs(s.roll.rollLengthM - pass.alongPathM - ROLL_PAST_M) };
}

/** Run the benchmark and return its figures (times are medians, ms). */
export function runPhysicsBench(options: { readRuns?: number; chartRuns?: number; baselineRuns?: number } = {}): PhysicsBenchFigures {
  const readRuns = options.readRuns ?? 2000;
  const chartRuns = options.chartRuns ?? 60;
  const baselineRuns = options.baselineRuns ?? 3;
  const reads = CASES.map((c) => {
    const { name, ...putt } = c;
    const input = { ...putt, pace: { rollPastM: ROLL_PAST_M } };
    const r = solveRead(input);
    if (!r.ok) throw new Error(`bench case ${name} cannot stop`);
    const medianMs = timeMs(() => solveRead(input), readRuns, 200);
    const base = baselineRead({ ...putt, rollPastM: ROLL_PAST_M });
    const baselineMedianMs = timeMs(() => baselineRead({ ...putt, rollPastM: ROLL_PAST_M }), baselineRuns, 1);
    const mine = check(c, r.read.launchSpeedMps, r.read.startLineDeg);
    const theirs = check(c, base.launchSpeedMps, (base.startLineRad * 180) / Math.PI);
    return {
      name,
      medianMs,
      baselineMedianMs,
      baselineRolls: base.rolls,
      ratio: baselineMedianMs / medianMs,
      passMm: mine.passMm,
      paceMm: mine.paceMm,
      baselinePassMm: theirs.passMm,
      baselinePaceMm: theirs.paceMm,
    };
  });
  const chartInput = {
    slopePct: 2,
    stimpFt: 10,
    distancesM: [1, 2, 3, 5, 8, 12],
    fallLineDegs: [0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330],
    pace: { rollPastM: ROLL_PAST_M },
  };
  const chartMedianMs = timeMs(() => breakChart(chartInput), chartRuns, 10);
  const readMedianMs = median(reads.map((r) => r.medianMs));
  const baselineReadMedianMs = median(reads.map((r) => r.baselineMedianMs));
  return {
    reads,
    readMedianMs,
    chartMedianMs,
    chartCells: chartInput.distancesM.length * chartInput.fallLineDegs.length,
    baselineReadMedianMs,
    ratio: baselineReadMedianMs / readMedianMs,
    goals: { readMs: 0.1, chartMs: 5, ratio: 200 },
  };
}

/** Print the figures as a table. */
export function printPhysicsBench(f: PhysicsBenchFigures): void {
  const pad = (s: string, n: number) => s.padEnd(n);
  const num = (x: number, d = 3, w = 10) => x.toFixed(d).padStart(w);
  console.log(pad("case", 28) + "   read ms  pass mm  pace mm  baseline ms  rolls   ratio  base pass mm  base pace mm");
  for (const r of f.reads) {
    console.log(
      pad(r.name, 28) +
        num(r.medianMs, 4) +
        num(r.passMm, 3, 9) +
        num(r.paceMm, 3, 9) +
        num(r.baselineMedianMs, 1, 13) +
        String(r.baselineRolls).padStart(7) +
        num(r.ratio, 0, 8) +
        num(r.baselinePassMm, 3, 14) +
        num(r.baselinePaceMm, 3, 14),
    );
  }
  const ok = (b: boolean) => (b ? "met" : "NOT met");
  console.log(
    `\nread (median of cases): ${f.readMedianMs.toFixed(4)} ms  goal ≤ ${f.goals.readMs} ms: ${ok(f.readMedianMs <= f.goals.readMs)}`,
  );
  console.log(
    `break chart (${f.chartCells} cells): ${f.chartMedianMs.toFixed(2)} ms  goal ≤ ${f.goals.chartMs} ms: ${ok(f.chartMedianMs <= f.goals.chartMs)}`,
  );
  console.log(
    `baseline read (mathjs solveODE RK45 at 1 mm + 2-D Newton shooting): ${f.baselineReadMedianMs.toFixed(1)} ms  ratio ${f.ratio.toFixed(0)}×  goal ≥ ${f.goals.ratio}×: ${ok(f.ratio >= f.goals.ratio)}`,
  );
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printPhysicsBench(runPhysicsBench());
}
