import { expect, test } from "vitest";
import { METRES_PER_FOOT } from "#shared/units";
import { bandLabel, bandsParam, DEFAULT_BAND_EDGES_M, edgesFromParam, edgesFromText, edgesToText } from "./bands";

test("bands are labelled in the user's unit, the last one open-ended", () => {
  expect(bandLabel(0, 3 * METRES_PER_FOOT, "imperial")).toBe("0–3 ft");
  expect(bandLabel(30 * METRES_PER_FOOT, null, "imperial")).toBe("30+ ft");
  expect(bandLabel(1.5, 2, "metric")).toBe("1.5–2 m");
  expect(edgesToText(DEFAULT_BAND_EDGES_M.imperial, "imperial")).toBe("3, 6, 10, 15, 20, 30");
});

test("the editor's text becomes metres, and round-trips through the URL", () => {
  const parsed = edgesFromText("3, 6; 10 15", "imperial");
  expect(parsed.ok).toBe(true);
  if (!parsed.ok) return;
  expect(parsed.edgesM.map((m) => m / METRES_PER_FOOT)).toEqual([3, 6, 10, 15].map((x) => expect.closeTo(x, 9)));
  const url = bandsParam(parsed.edgesM)!;
  expect(url).toBe("0.9144,1.8288,3.048,4.572");
  expect(edgesFromParam(url)).toEqual([0.9144, 1.8288, 3.048, 4.572]);
  expect(edgesFromText("0, 1, 2", "metric")).toEqual({ ok: true, edgesM: [1, 2] });
});

test("edges that the API would refuse are explained before sending", () => {
  expect(edgesFromText("", "metric")).toMatchObject({ ok: false });
  expect(edgesFromText("1, x", "metric")).toMatchObject({ ok: false, message: expect.stringMatching(/Only numbers/) });
  expect(edgesFromText("2, 1", "metric")).toMatchObject({ ok: false, message: expect.stringMatching(/longer than the one before/) });
  expect(edgesFromText("1, 70", "metric")).toMatchObject({ ok: false, message: expect.stringMatching(/up to 60 m/) });
  expect(edgesFromText("-1", "metric")).toMatchObject({ ok: false });
  expect(edgesFromParam("2,1")).toBeNull();
  expect(edgesFromParam(null)).toBeNull();
  expect(bandsParam(null)).toBeUndefined();
});
