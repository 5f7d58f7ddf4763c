// npm run bench: every benchmark in one run, each as figures and ratios against a reference
// measured in the same run. Timing goals are reported here, never asserted in tests.
import { printPhysicsBench, runPhysicsBench } from "./physics";

const only = process.argv[2];

if (!only || only === "physics") {
  console.log("== physics: inverse read and break chart vs mathjs solveODE + bisection");
  printPhysicsBench(runPhysicsBench());
}
