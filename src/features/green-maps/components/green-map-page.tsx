// A green's height map: upload it, see its summary, tap the ball and the hole on the map, and get the read on that
// real surface (POST /api/greens/:id/reads/solve), drawn on the map and in 3D.
import type { HeightMapResponse } from "#shared/schemas/height-map";
import { Alert, Button, ButtonLink, Card, PageHeader, PageSpinner } from "../../../components/ui";
import { paths } from "../../../config/paths";
import { isApiError } from "../../../lib/api-client";
import { useUnits } from "../../auth/hooks/use-units";
import { useGreen } from "../api/get-green";
import { useHeightMap } from "../api/get-height-map";
import { HeightMapUpload } from "./height-map-upload";
import { WalkGreen } from "./walk-green";
import { MapWorkspace } from "./map-workspace";

export function GreenMapPage({ greenId }: { greenId: string }) {
  const { units } = useUnits();
  const green = useGreen(greenId);
  // Asked only once the green says it has a map: a green without one makes no request (and no 404 in the console).
  const hasMap = green.data?.hasHeightMap ?? false;
  const map = useHeightMap(greenId, hasMap);
  const mapData = hasMap ? (map.data ?? null) : null;

  if (green.isPending || (hasMap && map.isPending)) return <PageSpinner label="Getting the green" />;
  if (green.isError && isApiError(green.error) && green.error.status === 404) {
    return (
      <>
        <PageHeader eyebrow="Green map" title="Green not found" />
        <Alert tone="info">This green does not exist, or it is not yours.</Alert>
      </>
    );
  }
  const failed = green.error ?? (hasMap ? map.error : null);
  if (failed) {
    return (
      <Alert
        tone="error"
        title="Could not load the green"
        action={
          <Button size="sm" variant="secondary" onClick={() => void Promise.all([green.refetch(), hasMap ? map.refetch() : null])}>
            Try again
          </Button>
        }
      >
        {failed.message}
      </Alert>
    );
  }
  const name = green.data?.name ?? "Green";
  const stimpFt = green.data?.currentStimpFt ?? null;
  // A green shared with the player's squad: read on it, but only its owner uploads or deletes the map.
  const canEdit = green.data?.mine ?? false;

  return (
    <>
      <title>{`${name} map · Borrowline`}</title>
      <PageHeader
        eyebrow="Green map"
        title={name}
        description={
          mapData
            ? "Tap where the ball lies and where the hole is cut; the read is rolled on this green's own surface."
            : canEdit
              ? "Walk the green with your phone, or upload a surveyed height map, to read putts on its real surface, bumps and all."
              : `No height map yet: ${green.data?.ownerName ?? "the person who keeps this green"} can upload one.`
        }
        actions={
          <ButtonLink to={paths.green.href(greenId)} variant="secondary" size="sm">
            Back to the green
          </ButtonLink>
        }
      />
      {mapData ? (
        <MapWorkspace key={mapIdentity(mapData)} greenId={greenId} map={mapData} units={units} greenStimpFt={stimpFt} canEdit={canEdit} />
      ) : !canEdit ? null : (
        <div className="flex flex-col gap-6">
          <Card id="map-by-walking">
            <WalkGreen greenId={greenId} replacing={false} />
          </Card>
          <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1.3fr)_minmax(0,1fr)]">
            <Card>
              <HeightMapUpload greenId={greenId} replacing={false} />
            </Card>
            <Card>
              <CsvHelp />
            </Card>
          </div>
        </div>
      )}
    </>
  );
}

function CsvHelp() {
  return (
    <div className="flex flex-col gap-2 text-sm text-ink-700">
      <h2 className="text-lg font-semibold tracking-tight text-ink-900">What the file looks like</h2>
      <p>
        A grid: one line per row of heights in metres, the northern edge first, each line running west to east, all lines the same length.
        Lines starting with # are notes. The spacing is the distance between neighbouring heights; the south-west corner is where the last
        line starts.
      </p>
      <pre className="overflow-x-auto rounded-lg bg-ink-900 p-3 text-xs text-sand-50">
        {"0.000,-0.010,-0.018\n0.017,0.008,-0.001\n0.034,0.025,0.016"}
      </pre>
      <p>Spot heights: one x,y,z line per surveyed point (metres east, north, up), with points at the corners of the area.</p>
    </div>
  );
}

/** Changes only when a different map is uploaded (not on a refetch of the same one), so the placed putt survives a refetch. */
function mapIdentity(m: HeightMapResponse): string {
  return [m.nx, m.ny, m.spacingM, m.originM.join(","), m.minHeightM, m.maxHeightM, m.maxSlopePct].join("|");
}
