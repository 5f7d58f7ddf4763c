import { expect, test } from "vitest";
import { cannotStopBody } from "./read-answers";
import { maxStoppableSlopeOf } from "./errors";

test("the steepest stoppable slope is read from a cannot-stop 422's details, never from its words", () => {
  expect(maxStoppableSlopeOf(cannotStopBody("cannot stop", "slopePct", 10, 7.8612))).toBe(7.861);
  // The same sentence without details gives nothing: prose is not parsed.
  expect(
    maxStoppableSlopeOf({ error: { code: "unprocessable", message: "… the steepest stoppable slope at this Stimp is 4.8 %." } }),
  ).toBeUndefined();
  expect(
    maxStoppableSlopeOf({ error: { code: "unprocessable", message: "x", details: { reason: "other", maxStoppableSlopePct: 3 } } }),
  ).toBeUndefined();
  expect(maxStoppableSlopeOf(null)).toBeUndefined();
});
