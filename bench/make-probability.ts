// Make-probability benchmark: median time of 10 000 simulated putts (closed-form rolls) for several reads, of
// "your best pace" (coarse-then-fine search), and of the dispersion estimate from a 600-putt log. The reference in the
// same run is a plain RK45 roll (mathjs solveODE, bench/physics-baseline.ts) per putt, scaled to 10 000 putts, on the
// same launches; the two must agree on holed or not. Run alone: npx tsx bench/make-probability.ts
import { pathToFileURL } from "node:url";
import {
  bestPace,
  estimateDispersion,
  makeProbability,
  newPlanarRollOut,
  planarRollField,
  resolveGreen,
  simulatePuttOutcomes,
  solveRead,
  rollPlanarInto,
  type LoggedPutt,
} from "../physics/index";
import { seededUniform } from "../shared/seeded-random";
import { rk45Holed, rk45Roll } from "./physics-baseline";
import { median, timeMs } from "./timing";

export interface MakeProbabilityBenchFigures {
  cases: { name: string; medianMs: number; makeProbability: number; rk45PerRollMs: number; ratio: number; agreement: number }[];
  samples: number;
  medianMs: number;
  bestPaceMedianMs: number;
  estimateMedianMs: number;
  estimatePutts: number;
  goals: { samplesMs: number; bestPaceMs: number };
}

const CASES = [
  { name: "3 m, 2 %, 90°, Stimp 10", distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 },
  { name: "6 m, 3 %, 135°, Stimp 11", distanceM: 6, slopePct: 3, fallLineDeg: 135, stimpFt: 11 },
  { name: "1.5 m, 1 %, 270°, Stimp 12", distanceM: 1.5, slopePct: 1, fallLineDeg: 270, stimpFt: 12 },
  { name: "10 m, 2.5 %, 60°, Stimp 9", distanceM: 10, slopePct: 2.5, fallLineDeg: 60, stimpFt: 9 },
  { name: "4 m, flat, Stimp 10", distanceM: 4, slopePct: 0, fallLineDeg: 0, stimpFt: 10 },
];
const DISPERSION = { angleDeg: 1.2, pace: 0.12 };
const SAMPLES = 10_000;

/** Run the benchmark and return its figures (times are medians, ms). */
export function runMakeProbabilityBench(options: { runs?: number; referenceRolls?: number } = {}): MakeProbabilityBenchFigures {
  const runs = options.runs ?? 15;
  const referenceRolls = options.referenceRolls ?? 100;
  const cases = CASES.map(({ name, ...read }) => {
    const input = { ...read, dispersion: DISPERSION, samples: SAMPLES };
    const r = makeProbability({ ...input, random: seededUniform(1) });
    if (!r.ok) throw new Error(`bench case ${name} cannot stop`);
    const medianMs = timeMs(() => makeProbability({ ...input, random: seededUniform(1) }), runs, 3);
    // The same launches rolled by RK45 and by the closed form: time per roll, and agreement on holed or not.
    const solved = solveRead(read);
    if (!solved.ok) throw new Error("cannot stop");
    const green = resolveGreen(read);
    const field = planarRollField(green);
    const out = newPlanarRollOut();
    const random = seededUniform(7);
    const launches = Array.from({ length: referenceRolls }, () => ({
      v: solved.read.launchSpeedMps * Math.exp(0.06 * (random() - 0.5)),
      s: ((solved.read.startLineDeg + 2.4 * (random() - 0.5)) * Math.PI) / 180,
    }));
    let agree = 0;
    const t0 = performance.now();
    const reference = launches.map((l) => rk45Holed(rk45Roll(green, l.v, l.s, read.distanceM)));
    const rk45PerRollMs = (performance.now() - t0) / referenceRolls;
    launches.forEach((l, i) => {
      rollPlanarInto(field, l.v, l.s, 0, read.distanceM, out);
      if (out.holed === reference[i]) agree++;
    });
    return {
      name,
      medianMs,
      makeProbability: r.result.makeProbability,
      rk45PerRollMs,
      ratio: (rk45PerRollMs * SAMPLES) / medianMs,
      agreement: agree / referenceRolls,
    };
  });
  const { name: _n, ...first } = CASES[0]!;
  const bestPaceMedianMs = timeMs(() => bestPace({ ...first, dispersion: DISPERSION, samples: SAMPLES, random: seededUniform(1) }), 9, 2);
  const log: LoggedPutt[] = [];
  const random = seededUniform(2);
  for (const distanceM of [1, 1.5, 2, 3, 4, 6, 8, 10]) {
    const r = simulatePuttOutcomes({ distanceM, slopePct: 0, fallLineDeg: 0, stimpFt: 10, dispersion: DISPERSION, samples: 75, random });
    if (r.ok) for (const p of r.putts) log.push({ distanceM, holed: p.holed, missSide: p.missSide, missLengthM: p.missLengthM });
  }
  const estimateMedianMs = timeMs(() => estimateDispersion(log), 7, 1);
  return {
    cases,
    samples: SAMPLES,
    medianMs: median(cases.map((c) => c.medianMs)),
    bestPaceMedianMs,
    estimateMedianMs,
    estimatePutts: log.length,
    goals: { samplesMs: 250, bestPaceMs: 50 },
  };
}

/** Print the figures as a table. */
export function printMakeProbabilityBench(f: MakeProbabilityBenchFigures): void {
  const pad = (s: string, n: number) => s.padEnd(n);
  const num = (x: number, d = 3, w = 10) => x.toFixed(d).padStart(w);
  console.log(pad("case", 28) + `  ${f.samples} putts ms   P(make)  RK45 ms/roll   ratio  agree*`);
  for (const c of f.cases) {
    console.log(
      pad(c.name, 28) +
        num(c.medianMs, 1, 17) +
        num(c.makeProbability, 3) +
        num(c.rk45PerRollMs, 3, 14) +
        num(c.ratio, 0, 8) +
        `${(100 * c.agreement).toFixed(0)} %`.padStart(7),
    );
  }
  console.log("* holed or not on the same launches; the RK45 reference judges capture at its closest pass, the closed form at the rim");
  const ok = (b: boolean) => (b ? "met" : "NOT met");
  console.log(
    `\n${f.samples} simulated putts (median of cases): ${f.medianMs.toFixed(1)} ms  goal ≤ ${f.goals.samplesMs} ms: ${ok(f.medianMs <= f.goals.samplesMs)}`,
  );
  console.log(
    `best pace (coarse-then-fine search, 1000 putts a pace + 2 × ${f.samples}): ${f.bestPaceMedianMs.toFixed(1)} ms  goal ≤ ${f.goals.bestPaceMs} ms: ${ok(f.bestPaceMedianMs <= f.goals.bestPaceMs)}`,
  );
  console.log(`dispersion estimate from ${f.estimatePutts} logged putts: ${f.estimateMedianMs.toFixed(1)} ms`);
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printMakeProbabilityBench(runMakeProbabilityBench());
}
