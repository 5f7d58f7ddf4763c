// @vitest-environment jsdom
// A field added to the read input reaches the physics and the 3D view without being rebuilt by hand (issue 16).
import "@testing-library/jest-dom/vitest";
import { cleanup, renderHook, screen } from "@testing-library/react";
import { afterEach, expect, expectTypeOf, test, vi } from "vitest";
import * as physics from "#physics";
import type { ReadInput } from "#physics";
import type { ReadRequest } from "#shared/schemas/reads";
import type { GreenViewProps } from "../../../components/green-3d/green-view";
import type { ScenePutt } from "../../../components/green-3d/scene-types";
import { renderRoute } from "../../../testing/render";
import { RehearsePage } from "../components/rehearse-page";
import type { RehearsePutt } from "../utils/rehearse-putt";
import { greenOf, replayOf, useRehearseReads, type RehearseGreen } from "./use-rehearse-reads";

vi.mock("#physics", async (importOriginal) => {
  const actual = await importOriginal<typeof physics>();
  return { ...actual, solveRead: vi.fn(actual.solveRead), simulateRoll: vi.fn(actual.simulateRoll) };
});
// The 3D view as the page hands it its props (the real one needs WebGL).
const seen: { putt: ScenePutt | null } = { putt: null };
vi.mock("../../../components/green-3d/green-view", () => ({
  GreenView: (props: GreenViewProps) => {
    seen.putt = props.putt;
    return <p>3D view</p>;
  },
}));
vi.mock("../../../components/green-3d/webgl", () => ({ useWebGL: () => true }));
vi.mock("../../auth/hooks/use-units", () => ({ useUnits: () => ({ units: "metric" }) }));
// The link codec is the URL's business: here it hands the page a putt with a field the schema does not have yet.
vi.mock("../utils/rehearse-putt", async (importOriginal) => {
  const actual = await importOriginal<typeof import("../utils/rehearse-putt")>();
  return {
    ...actual,
    decodeRehearse: (params: URLSearchParams, units: "metric" | "imperial") => {
      const d = actual.decodeRehearse(params, units);
      return { ...d, putt: { ...d.putt, windMps: 3 } };
    },
  };
});

afterEach(() => {
  cleanup();
  vi.clearAllMocks();
  seen.putt = null;
});

const putt = { distanceM: 3, slopePct: 2, fallLineDeg: 90, stimpFt: 10 };

test("the rehearsed green is typed from the shared read schema, so a new schema field is part of it (type-level)", () => {
  expectTypeOf<RehearseGreen>().toEqualTypeOf<Omit<ReadRequest, "pace">>();
  expectTypeOf<RehearsePutt>().toEqualTypeOf<RehearseGreen & { rollPastM: number }>();
  // It is what the physics and the 3D view take, whole.
  expectTypeOf<RehearseGreen>().toMatchTypeOf<Omit<ReadInput, "pace">>();
  expectTypeOf<RehearseGreen>().toMatchTypeOf<ScenePutt>();
  // An extra field survives greenOf in its type, not only at run time.
  expectTypeOf(greenOf({ ...putt, rollPastM: 0.45, windMps: 3 })).toEqualTypeOf<{
    distanceM: number;
    slopePct: number;
    fallLineDeg: number;
    stimpFt: number;
    windMps: number;
  }>();
});

test("an extra field of the read input reaches solveRead and the replay's simulateRoll unchanged", () => {
  const green = { ...putt, windMps: 3 };
  const { result } = renderHook(() => useRehearseReads(green, 0.3));
  expect(result.current.current.ok).toBe(true);
  const inputs = vi.mocked(physics.solveRead).mock.calls.map(([input]) => input);
  expect(inputs).toHaveLength(3);
  for (const input of inputs) expect(input).toMatchObject({ windMps: 3, distanceM: 3, stimpFt: 10 });
  expect(inputs.map((i) => i.pace)).toEqual([{ rollPastM: 0.3 }, { rollPastM: 0 }, { rollPastM: 1.5 }]);
  if (!result.current.current.ok) return;
  expect(replayOf(green, result.current.current.read, 1, 1)).not.toBeNull();
  expect(vi.mocked(physics.simulateRoll).mock.calls[0]![0]).toMatchObject({ windMps: 3 });
});

test("on the rehearse page, an extra field of the decoded putt reaches the 3D view and the physics", async () => {
  renderRoute(<RehearsePage />, { at: "/rehearse?d=4&s=1.5&f=270&st=11&rp=0.3" });
  expect(await screen.findByText("3D view")).toBeInTheDocument();
  expect(seen.putt).toEqual({ distanceM: 4, slopePct: 1.5, fallLineDeg: 270, stimpFt: 11, windMps: 3 });
  expect(vi.mocked(physics.solveRead).mock.calls.some(([input]) => (input as { windMps?: number }).windMps === 3)).toBe(true);
});
