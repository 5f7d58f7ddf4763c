// npm run bench: every benchmark in one run, each as figures and ratios against a reference
// measured in the same run. Timing goals are reported here, never asserted in tests.
import { printMakeProbabilityBench, runMakeProbabilityBench } from "./make-probability";
import { printPhysicsBench, runPhysicsBench } from "./physics";
import { printStatsBench, runStatsBench } from "./stats";

const only = process.argv[2];

if (!only || only === "physics") {
  console.log("== physics: inverse read (closed form) and break chart vs mathjs solveODE RK45 + 2-D Newton shooting");
  printPhysicsBench(runPhysicsBench());
}

if (!only || only === "make-probability") {
  console.log("\n== make probability: 10 000 simulated putts (closed-form rolls) vs a plain RK45 roll per putt");
  printMakeProbabilityBench(runMakeProbabilityBench());
}

if (!only || only === "stats") {
  console.log("\n== stats: make-rate query on 50 000 putts (PGlite)");
  printStatsBench(await runStatsBench());
}
