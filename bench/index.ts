// npm run bench: every benchmark in one run, each as figures and ratios against a reference
// measured in the same run. Timing goals are reported here, never asserted in tests.
import { printConcurrencyBench, runConcurrencyBench } from "./concurrency";
import { printMemoryBench, runMemoryBench } from "./memory";
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
  console.log("\n== stats: make rates, trend and compare on 500 000 stored putts (PGlite), with and without a date range");
  printStatsBench(await runStatsBench());
}

if (!only || only === "concurrency") {
  console.log("\n== concurrency: /api/health and a putt post while a 50 000-row import and make-rate reads on 500 000 putts run");
  printConcurrencyBench(await runConcurrencyBench());
}

if (!only || only === "memory") {
  console.log("\n== memory: server RSS right after start on an empty database (PGlite buffer pool ours vs default)");
  printMemoryBench(runMemoryBench());
}
