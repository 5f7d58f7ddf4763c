import { expect, test } from "vitest";
import { REHEARSE_DEFAULTS, decodeRehearseQuery, encodeRehearseQuery } from "./rehearse-query";

test("an empty query gives the default putt: 3 m, 2 %, falls right, Stimp 10, 45 cm past", () => {
  expect(decodeRehearseQuery(new URLSearchParams(""))).toEqual({ putt: REHEARSE_DEFAULTS, replaced: [] });
});

test("a read's link (the same keys as /read) decodes to that putt, in SI", () => {
  const { putt } = decodeRehearseQuery(new URLSearchParams("d=3.048&s=2.5&f=270&st=11&rp=0.4318"));
  expect(putt).toEqual({ distanceM: 3.048, slopePct: 2.5, fallLineDeg: 270, stimpFt: 11, rollPastM: 0.4318 });
});

test("values that are not numbers or out of range take the default and are named", () => {
  const { putt, replaced } = decodeRehearseQuery(new URLSearchParams("d=abc&s=12&rp=2.5&st=9"));
  expect(putt).toMatchObject({ distanceM: 3, slopePct: 2, rollPastM: 0.45, stimpFt: 9 });
  expect(replaced.sort()).toEqual(["distanceM", "rollPastM", "slopePct"]);
});

test("encode and decode round-trip", () => {
  const p = { distanceM: 5.5, slopePct: 1.5, fallLineDeg: 135, stimpFt: 9.5, rollPastM: 0.2 };
  expect(decodeRehearseQuery(new URLSearchParams(encodeRehearseQuery(p))).putt).toEqual(p);
  expect(encodeRehearseQuery(p)).toBe("d=5.5&s=1.5&f=135&st=9.5&rp=0.2");
});
