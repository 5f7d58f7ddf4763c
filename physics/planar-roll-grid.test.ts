// The closed-form roll against the odex roll on a dense grid of reads and start lines across the hole (issue 13).
import { expect, test } from "vitest";
import { maxStoppableSlopePct, rollClosedForm, simulateRoll, solveRead } from "./index";

const ONE_MM = 1e-3;
const FALL_LINES = Array.from({ length: 36 }, (_, i) => i * 10);
const DISTANCES_M = [0.5, 3, 8, 20];
const ROLL_PASTS_M = [0, 0.5, 2];
/** Offsets of the start line at the hole, m: across the hole from one edge to the other and just outside. */
const ACROSS_M = [-0.07, -0.035, 0, 0.035, 0.07];

test("closed form and odex agree on a dense grid: pass distance, pass speed and rest point to 1 mm (derived)", () => {
  const stimpFt = 10;
  // Slopes up to the stopping limit: gentle, half the limit and 95 % of it (the solvers refuse the last 1 %).
  const slopes = [1, 0.5 * maxStoppableSlopePct(stimpFt), 0.95 * maxStoppableSlopePct(stimpFt)];
  let worst = { pass: 0, speed: 0, rest: 0 };
  let rolls = 0;
  for (const slopePct of slopes) {
    for (const fallLineDeg of FALL_LINES) {
      for (const distanceM of DISTANCES_M) {
        for (const rollPastM of ROLL_PASTS_M) {
          const green = { distanceM, slopePct, fallLineDeg, stimpFt };
          const read = solveRead({ ...green, pace: { rollPastM } });
          if (!read.ok) throw new Error(`cannot stop: ${JSON.stringify(green)}`);
          for (const across of ACROSS_M) {
            const input = {
              ...green,
              launchSpeedMps: read.read.launchSpeedMps,
              startLineDeg: read.read.startLineDeg + (Math.atan2(across, distanceM) * 180) / Math.PI,
            };
            const ode = simulateRoll(input);
            const fast = rollClosedForm(input);
            if (!ode.ok || !fast.ok) throw new Error("cannot stop");
            rolls++;
            const a = ode.roll;
            const b = fast.roll;
            const pass = Math.abs(a.closestApproach.distanceM - b.closestApproach.distanceM);
            const speed = Math.abs(a.closestApproach.speedMps - b.closestApproach.speedMps);
            const rest = Math.hypot(a.restM[0] - b.restM[0], a.restM[1] - b.restM[1]);
            worst = { pass: Math.max(worst.pass, pass), speed: Math.max(worst.speed, speed), rest: Math.max(worst.rest, rest) };
            const where = JSON.stringify(input);
            expect(pass, where).toBeLessThan(ONE_MM);
            expect(speed, where).toBeLessThan(ONE_MM);
            expect(rest, where).toBeLessThan(ONE_MM);
            if (Math.abs(a.capture.marginMps) > 1e-3) expect(b.capture.holed, where).toBe(a.capture.holed);
          }
        }
      }
    }
  }
  console.log(
    `closed form vs odex over ${rolls} rolls: worst pass ${(1000 * worst.pass).toFixed(4)} mm, pass speed ${(1000 * worst.speed).toFixed(4)} mm/s, rest ${(1000 * worst.rest).toFixed(4)} mm`,
  );
});

test("the issue's repro holes in both rolls: 6 m, 1.5 %, fall line 135°, Stimp 11, 2.64253 m/s, −3.2095°", () => {
  const input = { distanceM: 6, slopePct: 1.5, fallLineDeg: 135, stimpFt: 11, launchSpeedMps: 2.64253, startLineDeg: -3.2095 };
  const ode = simulateRoll(input);
  const fast = rollClosedForm(input);
  if (!ode.ok || !fast.ok) throw new Error("cannot stop");
  expect(ode.roll.capture.holed).toBe(true);
  expect(fast.roll.capture.holed).toBe(true);
  expect(fast.roll.closestApproach.distanceM).toBeLessThan(0.031);
  expect(Math.abs(fast.roll.closestApproach.distanceM - ode.roll.closestApproach.distanceM)).toBeLessThan(ONE_MM);
});
