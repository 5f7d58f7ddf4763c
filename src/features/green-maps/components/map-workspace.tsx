// The map of a green with a height map (green-map-page.tsx): place the ball and the hole (tap or keyboard), and see
// the read on that real surface drawn on the map and in 3D.
import { parseDecimal } from "#shared/units";
import { formatStimp } from "#shared/format";
import { useMemo, useState } from "react";
import clsx from "clsx";
import { surfaceFromGrid } from "#physics";
import type { HeightMapResponse } from "#shared/schemas/height-map";
import { formatLength, formatShort, shortUnitLabel, type UnitSystem } from "#shared/units";
import { aimWords } from "../../../components/green-3d/words";
import { CameraButtons } from "../../../components/green-3d/camera-buttons";
import { contourIntervalM } from "../../../components/green-3d/frame";
import type { CameraView } from "../../../components/green-3d/scene-types";
import { heightRaster } from "../../../components/green-3d/surface-grid";
import { SurfaceView } from "../../../components/green-3d/surface-view";
import { useWebGL } from "../../../components/green-3d/webgl";
import { Alert, Button, Card, InputField, PageSpinner } from "../../../components/ui";
import { isApiError } from "../../../lib/api-client";
import { useSurfaceRead } from "../api/solve-on-surface";
import { useDebouncedValue } from "../hooks/use-debounced-value";
import { slopeTicks } from "../utils/slope-ticks";
import { aimSpot, roundCm } from "../utils/map-view";
import { surfaceSolveRequest } from "../utils/solve-request";
import { HeightMapSummary } from "./height-map-summary";
import { HeightMapUpload } from "./height-map-upload";
import { MapLegend } from "./map-legend";
import { SurfaceMap } from "./surface-map";
import { SurfaceReadAnswer } from "./surface-read-answer";
import { WalkGreen } from "./walk-green";

const EXAGGERATION = 5;

type Placing = "ball" | "hole";

export function MapWorkspace({
  greenId,
  map,
  units,
  greenStimpFt,
  canEdit,
}: {
  greenId: string;
  map: HeightMapResponse;
  units: UnitSystem;
  greenStimpFt: number | null;
  canEdit: boolean;
}) {
  const [ball, setBall] = useState<[number, number] | null>(null);
  const [hole, setHole] = useState<[number, number] | null>(null);
  const [placing, setPlacing] = useState<Placing>("ball");
  const [stimpText, setStimpText] = useState(formatStimp(greenStimpFt ?? 10));
  const [rollPastText, setRollPastText] = useState(units === "imperial" ? "17" : "45");
  const [view, setView] = useState<{ view: CameraView; key: number }>({ view: "free", key: 0 });
  const [exaggerate, setExaggerate] = useState(false);
  const webgl = useWebGL();

  const surface = useMemo(() => surfaceFromGrid(map), [map]);
  const raster = useMemo(() => heightRaster(map, 128, surface), [map, surface]);
  const ticks = useMemo(() => slopeTicks(surface, raster.bounds), [surface, raster]);
  const interval = contourIntervalM(raster.maxM - raster.minM, units, 14);

  const { request, errors } = surfaceSolveRequest({ ball, hole, stimpText, rollPastText, units });
  const settled = useDebouncedValue(request, 300);
  const read = useSurfaceRead(greenId, settled);
  const answer = request && read.data && !read.isError ? read.data : null;
  const aim = answer && ball && hole && answer.aimOffsetM !== null ? aimSpot(ball, hole, answer.aimOffsetM) : null;

  const place = (point: [number, number]) => {
    if (placing === "ball") {
      setBall(point);
      if (!hole) setPlacing("hole");
    } else {
      setHole(point);
    }
  };

  const readError = read.error;
  const fieldErrors = isApiError(readError) ? readError.fields : {};
  const description = `${ball ? `Ball ${positionWords(ball)}` : "No ball placed yet"}; ${hole ? `hole ${positionWords(hole)}` : "no hole placed yet"}.${answer ? ` Aim ${aimWords(answer.aimOffsetM, units, answer.startLineDeg)}.` : ""}`;

  return (
    <div className="flex flex-col gap-6">
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1.3fr)_minmax(0,1fr)]">
        <Card className="flex flex-col gap-4">
          <div role="group" aria-label="What a tap places" className="flex flex-wrap items-center gap-2">
            <span className="text-sm font-medium text-ink-800">A tap places</span>
            {(["ball", "hole"] as const).map((p) => (
              <button
                key={p}
                type="button"
                aria-pressed={placing === p}
                onClick={() => setPlacing(p)}
                className={clsx(
                  "min-h-11 rounded-xl border-2 px-4 text-sm font-medium transition-colors focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-coral-500",
                  placing === p
                    ? "border-ink-900 bg-ink-900 text-sand-50"
                    : "border-ink-900/15 bg-sand-50 text-ink-900 hover:border-ink-900/30",
                )}
              >
                {p === "ball" ? "the ball" : "the hole"}
              </button>
            ))}
          </div>
          <SurfaceMap
            raster={raster}
            contourIntervalM={interval}
            ticks={ticks}
            ball={ball}
            hole={hole}
            aim={aim}
            line={answer?.path ?? null}
            placing={placing}
            onTap={place}
            units={units}
            description={description}
          />
          {answer ? (
            <p className="font-semibold text-ink-900 lg:hidden" aria-hidden="true">
              Aim {aimWords(answer.aimOffsetM, units, answer.startLineDeg)}, finish {formatShort(answer.rollPastM, units)} past; as hard as
              a flat {formatLength(Math.max(0, answer.flatPuttLengthM), units)} putt.
            </p>
          ) : null}
          <p className="text-sm text-ink-600" data-testid="placement">
            {ball ? `Ball ${positionWords(ball)}` : "Ball not placed"} · {hole ? `hole ${positionWords(hole)}` : "hole not placed"}{" "}
            <span className="text-ink-500">(metres from the south-west corner of the map)</span>
          </p>
          <MapLegend contourIntervalM={interval} units={units} />
          <PositionInputs ball={ball} hole={hole} onBall={setBall} onHole={setHole} />
        </Card>

        <div className="flex flex-col gap-6 lg:sticky lg:top-20">
          <Card className="flex flex-col gap-4">
            <div className="grid grid-cols-2 gap-4">
              <InputField
                label="Stimp (ft)"
                inputMode="decimal"
                value={stimpText}
                onChange={(e) => setStimpText(e.target.value)}
                hint={greenStimpFt !== null ? `This green's latest: ${greenStimpFt} ft` : "Green speed, 4–16 ft"}
                error={errors.stimp ?? fieldErrors.stimpFt}
              />
              <InputField
                label={`Past the hole (${shortUnitLabel(units)})`}
                inputMode="decimal"
                value={rollPastText}
                onChange={(e) => setRollPastText(e.target.value)}
                hint="Where it stops if it misses"
                error={errors.rollPast ?? fieldErrors["pace.rollPastM"]}
              />
            </div>
            {errors.placement ? (
              <p className="text-ink-600" role="status">
                {errors.placement}
              </p>
            ) : readError && isApiError(readError) && readError.status === 422 ? (
              <Alert tone="warning" title="No read from here at this pace">
                {readError.message} Try a firmer pace or another spot.
              </Alert>
            ) : readError ? (
              <Alert tone="error" title="Could not work out the read">
                {Object.values(fieldErrors).join("; ") || readError.message}
              </Alert>
            ) : answer ? (
              <SurfaceReadAnswer
                read={answer}
                units={units}
                updating={read.isFetching || read.isPlaceholderData || JSON.stringify(settled) !== JSON.stringify(request)}
              />
            ) : (
              <PageSpinner label="Rolling the putt on this green" />
            )}
          </Card>
        </div>
      </div>

      <Card padded={false} className="overflow-hidden">
        <div className="p-5 pb-3 sm:px-7">
          <h2 className="text-lg font-semibold tracking-tight">The green in 3D</h2>
          <p className="text-sm text-ink-600">Drag to turn it, pinch or scroll to zoom.</p>
        </div>
        <SurfaceView
          className="h-[380px] sm:h-[460px]"
          webgl={webgl}
          map={map}
          ball={ball}
          hole={hole}
          aim={aim}
          line={answer?.path ?? null}
          contourIntervalM={interval}
          exaggeration={exaggerate ? EXAGGERATION : 1}
          view={view.view}
          viewKey={view.key}
          label={`The green in 3D. ${description}`}
          toolbar={<CameraButtons view={view.view} onView={(v) => setView((s) => ({ view: v, key: s.key + 1 }))} />}
        />
        <div className="flex flex-col gap-3 p-5 sm:px-7">
          <MapLegend contourIntervalM={interval} units={units} ticks={false} />
          <label className="flex min-h-11 items-center gap-3 text-sm font-medium">
            <input
              type="checkbox"
              className="size-5 accent-ink-900"
              checked={exaggerate}
              onChange={(e) => setExaggerate(e.target.checked)}
            />
            Draw the heights {EXAGGERATION}× taller than they are
          </label>
        </div>
      </Card>

      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card>
          <HeightMapSummary greenId={greenId} summary={map} units={units} canEdit={canEdit} />
        </Card>
        {canEdit ? (
          <Card>
            <HeightMapUpload greenId={greenId} replacing />
          </Card>
        ) : null}
      </div>
      {canEdit ? (
        <Card id="map-by-walking">
          <WalkGreen greenId={greenId} replacing />
        </Card>
      ) : null}
    </div>
  );
}

function positionWords([x, y]: readonly [number, number]): string {
  return `${x.toFixed(1)} m east, ${y.toFixed(1)} m north`;
}

/** The keyboard's way to place the ball and the hole: metres east and north of the map's south-west corner. */
function PositionInputs({
  ball,
  hole,
  onBall,
  onHole,
}: {
  ball: [number, number] | null;
  hole: [number, number] | null;
  onBall: (p: [number, number]) => void;
  onHole: (p: [number, number]) => void;
}) {
  const [text, setText] = useState({ bx: "", by: "", hx: "", hy: "" });
  const num = (t: string) => parseDecimal(t) ?? Number.NaN;
  const apply = () => {
    const b: [number, number] = [num(text.bx), num(text.by)];
    const h: [number, number] = [num(text.hx), num(text.hy)];
    if (text.bx && text.by && b.every(Number.isFinite)) onBall([roundCm(b[0]), roundCm(b[1])]);
    if (text.hx && text.hy && h.every(Number.isFinite)) onHole([roundCm(h[0]), roundCm(h[1])]);
  };
  const field = (key: keyof typeof text, label: string, current: number | undefined) => (
    <InputField
      label={label}
      inputMode="decimal"
      value={text[key]}
      placeholder={current !== undefined ? String(current) : undefined}
      onChange={(e) => setText((t) => ({ ...t, [key]: e.target.value }))}
    />
  );
  return (
    <details className="rounded-xl border-2 border-ink-900/10 px-4 py-3">
      <summary className="min-h-8 cursor-pointer text-sm font-medium">Type the positions instead</summary>
      <form
        className="mt-3 grid grid-cols-2 gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          apply();
        }}
      >
        {field("bx", "Ball, east (m)", ball?.[0])}
        {field("by", "Ball, north (m)", ball?.[1])}
        {field("hx", "Hole, east (m)", hole?.[0])}
        {field("hy", "Hole, north (m)", hole?.[1])}
        <div className="col-span-2">
          <Button type="submit" size="sm" variant="secondary">
            Place them
          </Button>
        </div>
      </form>
    </details>
  );
}
